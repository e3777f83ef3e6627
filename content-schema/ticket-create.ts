import { z } from "zod";

import { idList, optionalId } from "./ticket-form-fields";

/** A new ticket, from the Support form or `POST /api/v1/vendors/{vendor}/tickets`. */
export const createTicketSchema = z.object({
  subject: z.string().trim().min(3, "Give the ticket a short subject.").max(200),
  body: z.string().trim().min(1, "Describe the question or the problem.").max(20_000),
  // Generated once per form by the client: a double submit repeats it and gets the same ticket.
  idempotencyKey: z
    .string()
    .trim()
    .min(8, "Missing idempotency key.")
    .max(100)
    .regex(/^[A-Za-z0-9_-]+$/),
  materialId: optionalId,
  machineId: optionalId,
  sheetVersionId: optionalId,
  attachmentIds: idList(10),
});
export type CreateTicketInput = z.infer<typeof createTicketSchema>;
