import "server-only";

import type { Vendor } from "@/content-schema/vendor";
import { PERMISSIONS } from "@/lib/auth/permissions";
import { db } from "@/lib/db/knex";
import { mailFooter, withFooter } from "@/lib/mail-preferences/preferences-link";
import { enqueueMail } from "@/lib/mail/enqueue-mail";

import { buildDigestContent, digestStopUrl, weekStartOf } from "./digest-content";
import { renderDigest } from "./digest-mail";

const FIELD_ROLES = PERMISSIONS["field.read"] as readonly string[];

/** One-click unsubscribe (RFC 8058) for mail clients that offer it. */
const unsubscribeHeaders = (stopUrl: string) => ({
  "List-Unsubscribe": `<${stopUrl}>`,
  "List-Unsubscribe-Post": "List-Unsubscribe=One-Click",
});

async function recipients(vendorId: string, userId?: string) {
  const q = db("members as m")
    .join("users as u", "u.id", "m.user_id")
    .where("m.vendor_id", vendorId)
    .whereIn("m.role", FIELD_ROLES)
    .select(
      "u.id",
      "u.email",
      db.raw(
        "not exists (select 1 from mail_preferences p where p.vendor_id = m.vendor_id and p.user_id = m.user_id and p.kind = 'weekly_digest' and not p.enabled) as wanted",
      ),
    );
  if (userId) q.where("u.id", userId);
  return q;
}

/**
 * The scheduled digest for one vendor: one e-mail per engineer or admin who has not stopped it.
 * A row per (vendor, person, week) makes a retried job send nothing twice.
 */
export async function sendVendorDigests(vendor: Vendor, now = new Date()): Promise<number> {
  const week = weekStartOf(now);
  const people = (await recipients(vendor.id)).filter((p) => p.wanted);
  if (!people.length) return 0;
  const content = await buildDigestContent(vendor, week);
  let sent = 0;
  for (const person of people) {
    const stopUrl = digestStopUrl(vendor, person.id);
    const mail = withFooter(
      renderDigest({ ...content, stopUrl }),
      mailFooter(vendor.slug, vendor.name, { vendorId: vendor.id, userId: person.id }),
    );
    await db.transaction(async (trx) => {
      const inserted = await trx("field_digests_sent")
        .insert({ vendor_id: vendor.id, user_id: person.id, week_start: week })
        .onConflict(["vendor_id", "user_id", "week_start"])
        .ignore()
        .returning("user_id");
      if (!inserted.length) return;
      // The mail job commits with the "sent" row: both or neither. The key makes a second queueing a no-op.
      await enqueueMail(
        trx,
        { to: person.email, ...mail, headers: unsubscribeHeaders(stopUrl) },
        { key: `digest:${vendor.id}:${person.id}:${week}` },
      );
      sent += 1;
    });
  }
  return sent;
}

/** "Send me the digest now": this week's lists to one engineer, whatever the weekly schedule has sent. */
export async function sendDigestOnRequest(vendor: Vendor, userId: string, now = new Date()): Promise<boolean> {
  const [person] = await recipients(vendor.id, userId);
  if (!person) return false;
  const stopUrl = digestStopUrl(vendor, person.id);
  const mail = withFooter(
    renderDigest({ ...(await buildDigestContent(vendor, weekStartOf(now))), stopUrl }),
    mailFooter(vendor.slug, vendor.name, { vendorId: vendor.id, userId: person.id }),
  );
  await enqueueMail(db, { to: person.email, ...mail, headers: unsubscribeHeaders(stopUrl) });
  return true;
}
