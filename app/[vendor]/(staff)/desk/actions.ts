"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";

import {
  bulkAssignSchema,
  problemReportSchema,
  snippetSchema,
  ticketReplySchema,
  ticketUpdateSchema,
} from "@/content-schema/ticket-update";
import { vendorAction } from "@/lib/actions/vendor-action";
import { db } from "@/lib/db/knex";
import { queueFiltersSchema } from "@/lib/desk/queue-filters";
import { saveDeskView } from "@/lib/desk/saved-views";
import { saveSnippet } from "@/lib/desk/snippets";
import { Conflict, InvalidInput, NotFound } from "@/lib/errors/domain-errors";
import { addStaffMessage } from "@/lib/tickets/add-message";
import { buildCard } from "@/lib/tickets/build-card";
import { createProblemReport } from "@/lib/tickets/problem-reports";
import { bulkAssign, updateTicket } from "@/lib/tickets/update-ticket";

const ticketPath = (vendor: string, id: string) => `/${vendor}/desk/tickets/${id}`;

// The panel sends only the fields the agent touched, plus what it showed for them (`was`), so a save
// never reverts a field it did not touch and refuses one that someone else changed meanwhile.
const ticketFormSchema = z.preprocess((raw) => {
  if (!raw || typeof raw !== "object") return raw;
  const { was, ...values } = raw as Record<string, unknown>;
  let shown: unknown = undefined;
  try {
    shown = typeof was === "string" && was ? JSON.parse(was) : undefined;
  } catch {
    shown = undefined;
  }
  return { ...values, expected: shown };
}, ticketUpdateSchema);

export const updateTicketAction = vendorAction({ permission: "desk.use", schema: ticketFormSchema }, async (input, { vendor, user }) => {
  try {
    const saved = await updateTicket({ vendor, actorUserId: user.id, input });
    revalidatePath(ticketPath(vendor.slug, input.ticketId));
    return { ok: true, message: "Ticket updated.", data: saved };
  } catch (error) {
    if (error instanceof Conflict) return { ok: false, message: error.message, data: error.details?.current };
    throw error;
  }
});

export const bulkAssignAction = vendorAction({ permission: "desk.use", schema: bulkAssignSchema }, async (input, { vendor, user }) => {
  const changed = await bulkAssign({ vendor, actorUserId: user.id, ticketIds: input.ticketIds, assigneeId: input.assigneeId });
  return { ok: true, message: `${changed} ticket${changed === 1 ? "" : "s"} assigned.` };
});

export const staffReplyAction = vendorAction({ permission: "desk.use", schema: ticketReplySchema }, async (input, { vendor, user }) => {
  const ticket = await db("tickets")
    .where({ id: input.ticketId, vendor_id: vendor.id })
    .first<{ customer_id: string } | undefined>("customer_id");
  if (!ticket) throw new NotFound();
  let card = null;
  if (input.cardSheetVersionId) {
    if (!input.cardMachineId)
      throw new InvalidInput("Please correct the marked fields.", {
        cardMachineId: ["Choose the customer's machine to adapt the sheet to."],
      });
    card = await buildCard({
      vendorId: vendor.id,
      sheetVersionId: input.cardSheetVersionId,
      machineId: input.cardMachineId,
      customerId: ticket.customer_id,
    });
  }
  await addStaffMessage({
    vendorId: vendor.id,
    ticketId: input.ticketId,
    authorId: user.id,
    body: input.body,
    visibility: input.visibility,
    card,
    attachmentIds: input.attachmentIds,
    idempotencyKey: input.idempotencyKey,
  });
  revalidatePath(ticketPath(vendor.slug, input.ticketId));
  return { ok: true, message: input.visibility === "note" ? "Note added." : "Reply sent." };
});

export const handoffAction = vendorAction({ permission: "desk.use", schema: problemReportSchema }, async (input, { vendor, user }) => {
  await createProblemReport({ vendorId: vendor.id, actorUserId: user.id, ...input });
  revalidatePath(ticketPath(vendor.slug, input.ticketId));
  return { ok: true, message: "Handed to engineering as a problem report on that sheet version." };
});

const filtersJson = z
  .string()
  .max(2000, "The filters are too long.")
  .transform((text, ctx) => {
    try {
      return JSON.parse(text || "{}") as unknown;
    } catch {
      ctx.addIssue({ code: "custom", message: "The filters could not be read. Choose them again and save." });
      return z.NEVER;
    }
  })
  .pipe(queueFiltersSchema);
const saveViewSchema = z.object({ name: z.string().trim().min(1, "Name the view.").max(60), filters: filtersJson });

export const saveViewAction = vendorAction({ permission: "desk.use", schema: saveViewSchema }, async (input, { vendor, user }) => {
  const { filters } = input;
  await saveDeskView({ vendorId: vendor.id, userId: user.id, name: input.name, filters });
  return { ok: true, message: `View “${input.name}” saved.` };
});

export const saveSnippetAction = vendorAction({ permission: "desk.use", schema: snippetSchema }, async (input, { vendor, user }) => {
  await saveSnippet({ vendorId: vendor.id, userId: user.id, ...input });
  revalidatePath(`/${vendor.slug}/desk`, "layout");
  return { ok: true, message: "Snippet saved." };
});
