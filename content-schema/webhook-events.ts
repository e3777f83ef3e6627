import { z } from "zod";

/** What a vendor can subscribe a webhook to. */
export const WEBHOOK_EVENT_TYPES = [
  "sheet.published",
  "sheet.superseded",
  "sheet.withdrawn",
  "ticket.created",
  "ticket.answered",
  "outcome.reported",
] as const;
export type WebhookEventType = (typeof WEBHOOK_EVENT_TYPES)[number];

export const webhookEventLabels: Record<WebhookEventType, string> = {
  "sheet.published": "A sheet version is published",
  "sheet.superseded": "A published version is replaced by a newer one",
  "sheet.withdrawn": "A version is withdrawn",
  "ticket.created": "A customer opens a ticket",
  "ticket.answered": "Support answers a ticket",
  "outcome.reported": "A customer reports how a cut went",
};

const sheetVersionRef = z.object({
  sheet: z.string().describe("The sheet's slug."),
  version: z.int().min(1),
  title: z.string(),
  url: z.url().describe("The version's page in the Library."),
});

export const webhookEventDataSchemas = {
  "sheet.published": sheetVersionRef.extend({ publishedAt: z.iso.datetime(), supersedes: z.int().min(1).nullable() }),
  "sheet.superseded": sheetVersionRef.extend({ supersededBy: z.int().min(1) }),
  "sheet.withdrawn": sheetVersionRef.extend({ reason: z.string().nullable() }),
  "ticket.created": z.object({
    ticketId: z.uuid(),
    number: z.int(),
    subject: z.string(),
    url: z.url().describe("The ticket in the Desk."),
  }),
  "ticket.answered": z.object({ ticketId: z.uuid(), number: z.int(), subject: z.string(), messageId: z.uuid(), url: z.url() }),
  "outcome.reported": z.object({
    outcomeId: z.uuid(),
    sheet: z.string(),
    version: z.int().min(1),
    result: z.enum(["worked_as_written", "worked_after_changes", "failed"]),
    symptom: z.string().nullable(),
  }),
} satisfies Record<WebhookEventType, z.ZodType>;

export type WebhookEventData<T extends WebhookEventType> = z.infer<(typeof webhookEventDataSchemas)[T]>;

/** The body of every delivery: signed as sent; `id` stays the same when a delivery is repeated. */
export const webhookEnvelopeSchema = <T extends WebhookEventType>(type: T) =>
  z.object({
    id: z.uuid().describe("The event's id: the same on every attempt and on redelivery, so receivers can drop repeats."),
    type: z.literal(type),
    vendor: z.string().describe("The vendor's slug."),
    occurredAt: z.iso.datetime(),
    data: webhookEventDataSchemas[type],
  });

export const webhookEventTypeSchema = z.enum(WEBHOOK_EVENT_TYPES);
