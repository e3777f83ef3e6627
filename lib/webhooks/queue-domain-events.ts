import "server-only";

import type { Knex } from "knex";

import type { OutcomeResult } from "@/content-schema/outcome-fields";
import { appUrl } from "@/lib/http/app-url";

import { queueWebhookEvent } from "./queue-webhook-event";

const hasWebhooks = async (trx: Knex.Transaction, vendorId: string) =>
  Boolean(await trx("webhooks").where({ vendor_id: vendorId }).first("id"));

/** ticket.answered, inside the transaction of the staff reply. */
export async function queueTicketAnswered(
  trx: Knex.Transaction,
  { vendorId, ticketId, messageId }: { vendorId: string; ticketId: string; messageId: string },
) {
  if (!(await hasWebhooks(trx, vendorId))) return;
  const ticket = await trx("tickets as t")
    .join("vendors as v", "v.id", "t.vendor_id")
    .where({ "t.id": ticketId, "t.vendor_id": vendorId })
    .first<{ number: number; subject: string; slug: string }>("t.number", "t.subject", "v.slug");
  await queueWebhookEvent(trx, {
    vendorId,
    type: "ticket.answered",
    data: { ticketId, number: ticket.number, subject: ticket.subject, messageId, url: appUrl(`/${ticket.slug}/desk/tickets/${ticketId}`) },
  });
}

/** outcome.reported, inside the transaction of the report. */
export async function queueOutcomeReported(
  trx: Knex.Transaction,
  o: { vendorId: string; outcomeId: string; versionId: string; result: OutcomeResult; symptom: string | null },
) {
  if (!(await hasWebhooks(trx, o.vendorId))) return;
  const version = await trx("sheet_versions as v")
    .join("sheets as s", (j) => j.on("s.id", "v.sheet_id").andOn("s.vendor_id", "v.vendor_id"))
    .where({ "v.id": o.versionId, "v.vendor_id": o.vendorId })
    .first<{ number: number; slug: string }>("v.number", "s.slug");
  await queueWebhookEvent(trx, {
    vendorId: o.vendorId,
    type: "outcome.reported",
    data: { outcomeId: o.outcomeId, sheet: version.slug, version: version.number, result: o.result, symptom: o.symptom },
  });
}
