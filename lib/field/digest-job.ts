import "server-only";

import { z } from "zod";

import { db } from "@/lib/db/knex";
import { enqueue } from "@/lib/jobs/enqueue";
import { listVendors } from "@/lib/vendors/get-vendor";

import { weekStartOf } from "./digest-content";
import { sendDigestOnRequest, sendVendorDigests } from "./send-digest";

export const FIELD_DIGEST_QUEUE = "field.weekly-digest";
/** Mondays at 07:00 UTC. */
export const FIELD_DIGEST_CRON = "0 7 * * 1";

const digestJobSchema = z.object({ vendorId: z.uuid().optional(), userId: z.uuid().optional() }).default({});
type DigestJob = z.infer<typeof digestJobSchema>;

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
