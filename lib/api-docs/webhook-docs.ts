import { WEBHOOK_EVENT_TYPES, webhookEnvelopeSchema, webhookEventLabels } from "@/content-schema/webhook-events";
import { DELIVERY_HEADER, EVENT_HEADER, REPLAY_WINDOW_SECONDS, SIGNATURE_HEADER, TIMESTAMP_HEADER } from "@/lib/webhooks/sign-payload";

import { jsonSchemaOf } from "./json-schema";

export const WEBHOOK_VERIFICATION = [
  `Every delivery is a POST with a JSON body and four headers: \`${EVENT_HEADER}\` (the event type), \`${DELIVERY_HEADER}\` (this delivery's id),`,
  `\`${TIMESTAMP_HEADER}\` (Unix seconds when it was signed) and \`${SIGNATURE_HEADER}\` (\`sha256=\` and a hex HMAC).`,
  "",
  "To check a delivery: take the raw body bytes as received (before any JSON parsing), compute HMAC-SHA256 with your webhook's",
  `signing secret over \`<timestamp>.<body>\`, and compare its hex form with the signature in constant time. Refuse the delivery when`,
  `the timestamp is more than ${REPLAY_WINDOW_SECONDS / 60} minutes away from your clock (a recorded delivery cannot be replayed later),`,
  "and drop an event id you have already handled: a retried or resent delivery keeps its event id and body, with a new timestamp and signature.",
  "",
  "Answer 2xx within 5 seconds; anything else (or no answer) is a failure. Failures are retried with growing waits (30 s, 1 min, 2 min, …",
  "up to 1 h, six attempts in all); after 15 failed attempts in a row the webhook pauses and the vendor's admins get an e-mail. Events",
  "that happen while it is paused are kept and sent on resume. Redirects are not followed.",
].join("\n");

/** The OpenAPI 3.1 `webhooks` section: one entry per event, the body as its schema. */
export function webhookDocs(): Record<string, unknown> {
  const header = (name: string, description: string) => ({ name, in: "header", required: true, schema: { type: "string" }, description });
  return Object.fromEntries(
    WEBHOOK_EVENT_TYPES.map((type) => [
      type,
      {
        post: {
          summary: webhookEventLabels[type],
          description: WEBHOOK_VERIFICATION,
          tags: ["Webhooks"],
          parameters: [
            header(SIGNATURE_HEADER, "sha256=<hex HMAC-SHA256 of `<timestamp>.<body>` with the signing secret>"),
            header(TIMESTAMP_HEADER, "Unix seconds when the delivery was signed."),
            header(EVENT_HEADER, `Always \`${type}\`.`),
            header(DELIVERY_HEADER, "The delivery's id (as in the delivery log)."),
          ],
          requestBody: { required: true, content: { "application/json": { schema: jsonSchemaOf(webhookEnvelopeSchema(type), "output") } } },
          responses: { "2XX": { description: "Received. Any other answer, or none within 5 seconds, is retried." } },
        },
      },
    ]),
  );
}
