import "server-only";

import type { Knex } from "knex";

import { appUrl } from "@/lib/http/app-url";
import { enqueueMail } from "@/lib/mail/enqueue-mail";

/** Pause a failing webhook and tell the vendor's admins, in the transaction that counted the last failure. */
export async function pauseWebhook(
  trx: Knex.Transaction,
  { vendorId, webhookId, failures }: { vendorId: string; webhookId: string; failures: number },
) {
  const pausedAt = new Date();
  await trx("webhooks").where({ id: webhookId, vendor_id: vendorId }).update({ state: "paused", paused_at: pausedAt });
  const hook = await trx("webhooks").where({ id: webhookId, vendor_id: vendorId }).first<{ url: string }>("url");
  const vendor = await trx("vendors").where({ id: vendorId }).first<{ slug: string; name: string }>("slug", "name");
  const admins = await trx("members as m")
    .join("users as u", "u.id", "m.user_id")
    .where({ "m.vendor_id": vendorId, "m.role": "admin" })
    .select<{ email: string }[]>("u.email");
  const link = appUrl(`/${vendor.slug}/admin/integrations/webhooks/${webhookId}`);
  for (const { email } of admins) {
    await enqueueMail(
      trx,
      {
        to: email,
        subject: `Webhook paused after ${failures} failed deliveries (${vendor.name})`,
        text: [
          `The webhook to ${hook.url} failed ${failures} times in a row, so Swarfbook stopped sending to it.`,
          "",
          "Events that happen while it is paused are kept and sent when you resume it.",
          `See the delivery log, fix the receiver, then resume: ${link}`,
        ].join("\n"),
      },
      { key: `webhook-paused:${webhookId}:${pausedAt.getTime()}` },
    );
  }
}
