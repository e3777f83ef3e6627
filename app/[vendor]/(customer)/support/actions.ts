"use server";

import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { z } from "zod";

import { createTicketSchema } from "@/content-schema/ticket-create";
import { idempotencyKeySchema, idList } from "@/content-schema/ticket-form-fields";
import { ticketRatingSchema } from "@/content-schema/ticket-update";
import { vendorAction } from "@/lib/actions/vendor-action";
import { addCustomerMessage } from "@/lib/tickets/add-message";
import { createTicket } from "@/lib/tickets/create-ticket";
import { rateTicket } from "@/lib/tickets/rate-ticket";

export const createTicketAction = vendorAction(
  { permission: "support.use", schema: createTicketSchema },
  async (input, { vendor, user }) => {
    const ticket = await createTicket({ vendor, customerId: user.id, input });
    revalidatePath(`/${vendor.slug}/support`);
    redirect(`/${vendor.slug}/support/tickets/${ticket.id}`);
  },
);

const customerReplySchema = z.object({
  ticketId: z.uuid(),
  body: z.string().trim().min(1, "Write a reply.").max(20_000),
  attachmentIds: idList(10),
  idempotencyKey: idempotencyKeySchema.optional(),
});

export const customerReplyAction = vendorAction(
  { permission: "support.use", schema: customerReplySchema },
  async (input, { vendor, user }) => {
    await addCustomerMessage({
      vendorId: vendor.id,
      ticketId: input.ticketId,
      authorId: user.id,
      body: input.body,
      attachmentIds: input.attachmentIds,
      idempotencyKey: input.idempotencyKey,
    });
    revalidatePath(`/${vendor.slug}/support/tickets/${input.ticketId}`);
    return { ok: true, message: "Reply sent." };
  },
);

export const rateTicketAction = vendorAction({ permission: "support.use", schema: ticketRatingSchema }, async (input, { vendor, user }) => {
  await rateTicket({ vendorId: vendor.id, customerId: user.id, input });
  revalidatePath(`/${vendor.slug}/support/tickets/${input.ticketId}`);
  return { ok: true, message: "Thank you for rating this ticket." };
});
