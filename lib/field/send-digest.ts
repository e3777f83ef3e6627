import "server-only";

import { z } from "zod";

import { outcomeSymptomLabels } from "@/content-schema/outcome-fields";
import { PERMISSIONS } from "@/lib/auth/permissions";
import { db } from "@/lib/db/knex";
import { appUrl } from "@/lib/http/app-url";
import { enqueue } from "@/lib/jobs/enqueue";
import { enqueueMail } from "@/lib/mail/enqueue-mail";
import { createStopToken } from "@/lib/mail/stop-token";
import { mailFooter, withFooter } from "@/lib/mail-preferences/preferences-link";
import { listVendors } from "@/lib/vendors/get-vendor";
import type { Vendor } from "@/lib/vendors/vendor-schema";

import { confidenceOf, percent } from "./confidence";
import { loadCoverageGaps } from "./coverage";
import { listCustomerChanges } from "./customer-changes";
import { describeChange } from "./describe-change";
import { type DigestMail, renderDigest } from "./digest-mail";
import { countNeedsAttention, listNeedsAttention } from "./needs-attention";
import { topSymptom } from "./rollup-rows";

export const FIELD_DIGEST_QUEUE = "field.weekly-digest";
/** Mondays at 07:00 UTC. */
export const FIELD_DIGEST_CRON = "0 7 * * 1";
const TOP = 5;

const digestJobSchema = z.object({ vendorId: z.uuid().optional(), userId: z.uuid().optional() }).default({});
type DigestJob = z.infer<typeof digestJobSchema>;

/** The Monday (UTC) of the week `at` falls in, as YYYY-MM-DD. */
export function weekStartOf(at: Date): string {
  const day = new Date(Date.UTC(at.getUTCFullYear(), at.getUTCMonth(), at.getUTCDate()));
  day.setUTCDate(day.getUTCDate() - ((day.getUTCDay() + 6) % 7));
  return day.toISOString().slice(0, 10);
}

export const digestStopUrl = (vendor: Pick<Vendor, "id" | "slug">, userId: string) =>
  appUrl(`/api/v1/vendors/${vendor.slug}/field/digest/stop?token=${createStopToken("weekly-digest", { vendorId: vendor.id, userId })}`);

/** The digest's lists for one vendor; the same for every engineer of that vendor. */
export async function buildDigestContent(vendor: Vendor, weekOf: string): Promise<Omit<DigestMail, "stopUrl">> {
  const { z: zValue, label } = confidenceOf(vendor.settings);
  const [attention, attentionTotal, changes, coverage] = await Promise.all([
    listNeedsAttention({ vendorId: vendor.id, z: zValue, limit: TOP }),
    countNeedsAttention({ vendorId: vendor.id }),
    listCustomerChanges({ vendorId: vendor.id, limit: TOP }),
    loadCoverageGaps({ vendorId: vendor.id }),
  ]);
  return {
    vendorName: vendor.name,
    weekOf,
    confidenceLabel: label,
    fieldUrl: appUrl(`/${vendor.slug}/drafting/field`),
    attention: attention.map((a) => {
      const symptom = topSymptom(a.symptoms);
      return { title: `${a.title} (${a.machineClass})`, number: a.number, failed: a.failed, outcomes: a.outcomes, lowerPct: percent(a.failure.lower), upperPct: percent(a.failure.upper), symptom: symptom && outcomeSymptomLabels[symptom], url: appUrl(`/${vendor.slug}/drafting/field/${a.sheetSlug}`) };
    }),
    attentionTotal,
    changes: changes.map((c) => ({ title: `${c.title} (${c.machineClass})`, number: c.number, sentence: describeChange(c) })),
    gaps: coverage.clusters.slice(0, TOP).map((c) => c.summary),
    moreGaps: Math.max(0, coverage.clusters.length - TOP),
    machines: coverage.machines,
  };
}

const FIELD_ROLES = PERMISSIONS["field.read"] as readonly string[];

async function recipients(vendorId: string, userId?: string) {
  const q = db("members as m")
    .join("users as u", "u.id", "m.user_id")
    .where("m.vendor_id", vendorId)
    .whereIn("m.role", FIELD_ROLES)
    .select("u.id", "u.email", db.raw("not exists (select 1 from mail_preferences p where p.vendor_id = m.vendor_id and p.user_id = m.user_id and p.kind = 'weekly_digest' and not p.enabled) as wanted"));
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
    const mail = withFooter(renderDigest({ ...content, stopUrl }), mailFooter(vendor.slug, vendor.name, { vendorId: vendor.id, userId: person.id }));
    await db.transaction(async (trx) => {
      const inserted = await trx("field_digests_sent").insert({ vendor_id: vendor.id, user_id: person.id, week_start: week }).onConflict(["vendor_id", "user_id", "week_start"]).ignore().returning("user_id");
      if (!inserted.length) return;
      // The mail job commits with the "sent" row: both or neither. The key makes a second queueing a no-op.
      await enqueueMail(trx, { to: person.email, ...mail, headers: { "List-Unsubscribe": `<${stopUrl}>`, "List-Unsubscribe-Post": "List-Unsubscribe=One-Click" } }, { key: `digest:${vendor.id}:${person.id}:${week}` });
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
  const mail = withFooter(renderDigest({ ...(await buildDigestContent(vendor, weekStartOf(now))), stopUrl }), mailFooter(vendor.slug, vendor.name, { vendorId: vendor.id, userId: person.id }));
  await enqueueMail(db, { to: person.email, ...mail, headers: { "List-Unsubscribe": `<${stopUrl}>`, "List-Unsubscribe-Post": "List-Unsubscribe=One-Click" } });
  return true;
}

export async function requestDigest(vendorId: string, userId: string): Promise<void> {
  await enqueue(db, FIELD_DIGEST_QUEUE, { vendorId, userId });
}

/**
 * The queue's handler. The weekly tick (no data) queues one job per vendor, so one vendor's failure is retried
 * on its own and never holds up the others; a job with a vendor sends its digests; one with a person too is a request.
 */
export async function weeklyDigestJob(data: unknown): Promise<void> {
  const job: DigestJob = digestJobSchema.parse(data ?? {});
  const vendors = await listVendors();
  if (!job.vendorId) {
    const week = weekStartOf(new Date());
    await db.transaction(async (trx) => {
      for (const vendor of vendors) await enqueue(trx, FIELD_DIGEST_QUEUE, { vendorId: vendor.id }, { key: `${vendor.id}:${week}` });
    });
    return;
  }
  const vendor = vendors.find((v) => v.id === job.vendorId);
  if (!vendor) return;
  if (job.userId) await sendDigestOnRequest(vendor, job.userId);
  else await sendVendorDigests(vendor);
}
