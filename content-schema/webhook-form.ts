import { z } from "zod";

import { WEBHOOK_EVENT_TYPES } from "./webhook-events";

/** Admin → Integrations: a new webhook. Where the URL points is checked by the server after DNS resolution. */
export const webhookFormSchema = z.object({
  url: z.string().trim().min(1, "Enter the address that receives the events.").max(2000, "At most 2000 characters."),
  description: z.string().trim().max(200, "At most 200 characters.").default(""),
  events: z.preprocess(
    (v) => (v === undefined ? [] : Array.isArray(v) ? v : [v]),
    z.array(z.enum(WEBHOOK_EVENT_TYPES, { error: "Unknown event." })).min(1, "Pick at least one event."),
  ),
});
export type WebhookForm = z.output<typeof webhookFormSchema>;

export const webhookIdSchema = z.object({ webhookId: z.uuid() });
export const deliveryIdSchema = z.object({ deliveryId: z.uuid() });
