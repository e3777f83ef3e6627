import type { Knex } from "knex";

import type { WebhookEventType } from "@/content-schema/webhook-events";
import { newWebhookSecret, sealSecret, secretHint } from "@/lib/webhooks/secret-box";

import type { SeededIds } from "./seed-foundation";

// One invented webhook per demo vendor, paused, to addresses under the reserved .example domain: the admin pages
// show how one looks, and nothing is ever sent from the demo.
const DEMO_WEBHOOKS: Record<string, { url: string; description: string; events: WebhookEventType[] }> = {
  northbeck: {
    url: "https://orders.northbeck.example/swarfbook-events",
    description: "Web shop: new and withdrawn sheets (demo, paused)",
    events: ["sheet.published", "sheet.superseded", "sheet.withdrawn"],
  },
  quillon: {
    url: "https://erp.quillon.example/hooks/swarfbook",
    description: "ERP: tickets and outcome reports (demo, paused)",
    events: ["ticket.created", "ticket.answered", "outcome.reported"],
  },
};

export async function seedWebhooks(knex: Knex, ids: SeededIds) {
  // Secrets are sealed with a key from the environment; without one there is nothing to seal them with.
  if (!process.env.WEBHOOK_SECRET_KEY && !process.env.NEXTAUTH_SECRET) return;
  for (const [slug, hook] of Object.entries(DEMO_WEBHOOKS)) {
    const vendorId = ids.vendors[slug];
    if (!vendorId) continue;
    const secret = newWebhookSecret();
    await knex("webhooks").insert({
      vendor_id: vendorId,
      ...hook,
      secret_encrypted: sealSecret(secret),
      secret_hint: secretHint(secret),
      state: "paused",
      paused_at: knex.fn.now(),
    });
  }
}
