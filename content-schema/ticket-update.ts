import { z } from "zod";

import { idempotencyKeySchema, idList, optionalId, tagList } from "./ticket-form-fields";
import { messageVisibilitySchema, ticketPrioritySchema, ticketStatusSchema } from "./ticket-status";

export const ticketReplySchema = z.object({
  ticketId: z.uuid(),
  body: z.string().trim().min(1, "Write a reply.").max(20_000),
  visibility: messageVisibilitySchema.default("public"),
  idempotencyKey: idempotencyKeySchema.optional(),
  // Staff only: embed this sheet version adapted to the customer's machine.
  cardSheetVersionId: optionalId,
  cardMachineId: optionalId,
  attachmentIds: idList(10),
});
export type TicketReplyInput = z.infer<typeof ticketReplySchema>;

/** What the editor showed for the fields it changed; a field whose stored value differs was changed by someone else. */
export const ticketExpectedSchema = z
  .object({
    status: z.string().max(40),
    priority: z.string().max(40),
    assigneeId: z.string().max(40),
    tags: z.string().max(2000),
  })
  .partial();

/** A staff change to one ticket; only the fields present change. `assigneeId: ""` unassigns. */
export const ticketUpdateSchema = z.object({
  ticketId: z.uuid(),
  status: ticketStatusSchema.optional(),
  priority: ticketPrioritySchema.optional(),
  assigneeId: z.union([z.literal(""), z.uuid()]).optional(),
  tags: tagList.optional(),
  expected: ticketExpectedSchema.optional(),
});
export type TicketUpdateInput = z.infer<typeof ticketUpdateSchema>;

export const bulkAssignSchema = z.object({ ticketIds: idList(200), assigneeId: z.union([z.literal(""), z.uuid()]) });

export const ticketRatingSchema = z.object({
  ticketId: z.uuid(),
  satisfaction: z.coerce.number().int().min(1, "Choose 1 to 5.").max(5, "Choose 1 to 5."),
  comment: z.string().trim().max(2000).default(""),
});
export type TicketRatingInput = z.infer<typeof ticketRatingSchema>;

export const problemReportSchema = z.object({
  ticketId: z.uuid(),
  sheetVersionId: z.uuid(),
  summary: z.string().trim().min(3, "Say what is wrong with the sheet.").max(200),
  details: z.string().trim().max(5000).default(""),
  idempotencyKey: idempotencyKeySchema.optional(),
});

export const snippetSchema = z.object({
  title: z.string().trim().min(1).max(80),
  body: z.string().trim().min(1).max(5000),
});

/** The ticket panel's four fields as the form shows them (tags as "a, b"); also what a save answers with. */
export type TicketPanelValues = { status: string; priority: string; assigneeId: string; tags: string };
export const panelValuesOf = (t: { status: string; priority: string; assigneeId: string | null; tags: string[] }): TicketPanelValues => ({
  status: t.status,
  priority: t.priority,
  assigneeId: t.assigneeId ?? "",
  tags: t.tags.join(", "),
});
