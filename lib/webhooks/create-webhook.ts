import "server-only";

import type { WebhookForm } from "@/content-schema/webhook-form";
import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { InvalidInput } from "@/lib/errors/domain-errors";

import { RefusedTarget, resolveTarget } from "./resolve-target";
import { newWebhookSecret, sealSecret, secretHint } from "./secret-box";
import { webhookSettings } from "./webhook-settings";

export const MAX_WEBHOOKS_PER_VENDOR = 20;

/** A new webhook; the signing secret is returned this once and stored encrypted. */
export async function createWebhook({
  vendorId,
  userId,
  input,
}: {
  vendorId: string;
  userId: string;
  input: WebhookForm;
}): Promise<{ id: string; secret: string }> {
  try {
    await resolveTarget(input.url, webhookSettings());
  } catch (error) {
    if (error instanceof RefusedTarget) throw new InvalidInput("Please correct the marked fields.", { url: [error.message] });
    throw error;
  }
  const secret = newWebhookSecret();
  return db.transaction(async (trx) => {
    await trx.raw<unknown>("select pg_advisory_xact_lock(hashtextextended(?, 11))", [vendorId]);
    const { count } = await trx("webhooks").where({ vendor_id: vendorId }).first<{ count: string }>(trx.raw("count(*) as count"));
    if (Number(count) >= MAX_WEBHOOKS_PER_VENDOR)
      throw new InvalidInput(`A workspace can have at most ${MAX_WEBHOOKS_PER_VENDOR} webhooks.`);
    const [row] = await trx("webhooks")
      .insert({
        vendor_id: vendorId,
        url: input.url,
        description: input.description,
        events: input.events,
        secret_encrypted: sealSecret(secret),
        secret_hint: secretHint(secret),
        created_by: userId,
      })
      .returning("id");
    await writeAudit(
      {
        vendorId,
        actorUserId: userId,
        action: "webhook.create",
        objectType: "webhook",
        objectId: row.id,
        details: { url: input.url, events: input.events },
      },
      trx,
    );
    return { id: row.id, secret };
  });
}
