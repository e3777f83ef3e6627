"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";

import { deliveryIdSchema, webhookFormSchema, webhookIdSchema } from "@/content-schema/webhook-form";
import { vendorAction } from "@/lib/actions/vendor-action";
import { createWebhook } from "@/lib/webhooks/create-webhook";
import { deleteWebhook, redeliverWebhook, resumeWebhook } from "@/lib/webhooks/manage-webhook";

const integrations = (slug: string) => `/${slug}/admin/integrations`;

export const createWebhookAction = vendorAction(
  { permission: "integrations.manage", schema: webhookFormSchema },
  async (input, { vendor, user }) => {
    const { id, secret } = await createWebhook({ vendorId: vendor.id, userId: user.id, input });
    revalidatePath(integrations(vendor.slug));
    return { ok: true, message: "Webhook added. Copy the signing secret now: it is not shown again.", data: { id, secret } };
  },
);

export const resumeWebhookAction = vendorAction(
  { permission: "integrations.manage", schema: webhookIdSchema },
  async (input, { vendor, user }) => {
    await resumeWebhook({ vendorId: vendor.id, userId: user.id, webhookId: input.webhookId });
    revalidatePath(`${integrations(vendor.slug)}/webhooks/${input.webhookId}`);
    return { ok: true, message: "Webhook resumed; events kept while it was paused are on their way." };
  },
);

export const deleteWebhookAction = vendorAction(
  { permission: "integrations.manage", schema: webhookIdSchema },
  async (input, { vendor, user }) => {
    await deleteWebhook({ vendorId: vendor.id, userId: user.id, webhookId: input.webhookId });
    revalidatePath(integrations(vendor.slug));
    return { ok: true, message: "Webhook removed." };
  },
);

export const redeliverAction = vendorAction(
  { permission: "integrations.manage", schema: z.object({ ...webhookIdSchema.shape, ...deliveryIdSchema.shape }) },
  async (input, { vendor }) => {
    await redeliverWebhook({ vendorId: vendor.id, webhookId: input.webhookId, deliveryId: input.deliveryId });
    revalidatePath(`${integrations(vendor.slug)}/webhooks/${input.webhookId}`);
    return { ok: true, message: "Sent again; refresh the log in a moment." };
  },
);
