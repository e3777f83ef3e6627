"use server";

import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { z } from "zod";

import { startDraftFromChangeSchema } from "@/content-schema/field-filters";
import { vendorAction } from "@/lib/actions/vendor-action";
import { confidenceOf } from "@/lib/field/confidence";
import { requestDigest } from "@/lib/field/digest-job";
import { startDraftFromChange } from "@/lib/field/start-draft-from-change";
import { setMailPreference } from "@/lib/mail-preferences/mail-preferences";
import { consumeRateLimit } from "@/lib/rate-limit/consume-rate-limit";

const vendorOnly = z.object({ vendor: z.string().min(1) });

export const sendDigestNowAction = vendorAction({ permission: "field.read", schema: vendorOnly }, async (_input, { vendor, user }) => {
  await consumeRateLimit({ key: `field-digest:${vendor.id}:${user.id}`, limit: 5, windowSeconds: 3600 });
  await requestDigest(vendor.id, user.id);
  return { ok: true, message: `This week's digest is on its way to ${user.email}.` };
});

const digestSchema = z.object({ vendor: z.string().min(1), enabled: z.enum(["on", "off"]) });

export const setWeeklyDigestAction = vendorAction({ permission: "field.read", schema: digestSchema }, async (input, { vendor, user }) => {
  await setMailPreference({ vendorId: vendor.id, userId: user.id, kind: "weekly_digest", enabled: input.enabled === "on" });
  revalidatePath(`/${vendor.slug}/drafting/field`);
  return { ok: true, message: input.enabled === "on" ? "The weekly digest is on." : "The weekly digest is off." };
});

// Only which suggestion: every number is recomputed from the rollups on the server.
export const startDraftFromChangeAction = vendorAction(
  { permission: "sheets.author", schema: startDraftFromChangeSchema.extend({ vendor: z.string().min(1) }) },
  async (input, { vendor, user }) => {
    const { z: zValue, label } = confidenceOf(vendor.settings);
    const draft = await startDraftFromChange({
      vendorId: vendor.id,
      userId: user.id,
      versionId: input.versionId,
      operationIndex: input.operationIndex,
      param: input.param,
      z: zValue,
      confidenceLabel: label,
    });
    redirect(`/${vendor.slug}/drafting/sheets/${draft.slug}/edit`);
  },
);
