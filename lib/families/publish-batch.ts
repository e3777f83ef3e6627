import "server-only";

import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { Conflict } from "@/lib/errors/domain-errors";
import { enqueue } from "@/lib/jobs/enqueue";
import { publishDraftIn } from "@/lib/sheets/publish-draft";
import { returnToDraftIn } from "@/lib/sheets/return-to-draft";
import { getVendorSettings } from "@/lib/vendors/vendor-settings";

import { includedItems, lockBatch, onSheet } from "./lock-batch";

export const FAMILY_ALERTS_QUEUE = "families.alerts";

/**
 * Publishes an approved batch in one transaction, each sheet through the single-sheet publish step: all sheets or
 * none. Sheets the reviewer left out go back to draft. The change alerts of the whole batch (one mail per
 * customer) are queued with it.
 */
export async function publishBatch({ vendorId, userId, slug, number }: { vendorId: string; userId: string; slug: string; number: number }) {
  const settings = await getVendorSettings(vendorId);
  return db.transaction(async (trx) => {
    const { batch } = await lockBatch(trx, { vendorId, slug, number, state: "approved" });
    const items = await includedItems(trx, vendorId, batch.id);
    for (const item of items) {
      const published = await onSheet(item.slug, () =>
        publishDraftIn(trx, { vendorId, userId, slug: item.slug, settings, batchId: batch.id }),
      );
      if (published.versionId !== item.version_id) throw new Conflict(`${item.slug}: its open version is not the one this batch wrote.`);
    }
    const excluded = await trx("family_batch_items as i")
      .join("sheets as s", function () {
        this.on("s.id", "i.sheet_id").andOn("s.vendor_id", "i.vendor_id");
      })
      .join("sheet_versions as v", function () {
        this.on("v.id", "i.version_id").andOn("v.vendor_id", "i.vendor_id");
      })
      .where({ "i.vendor_id": vendorId, "i.batch_id": batch.id, "v.state": "in_review" })
      .whereNotNull("i.excluded_reason")
      .select<{ slug: string; excluded_reason: string }[]>("s.slug", "i.excluded_reason");
    for (const item of excluded) await returnToDraftIn(trx, { vendorId, userId, slug: item.slug, reason: item.excluded_reason });
    await trx("family_batches")
      .where({ vendor_id: vendorId, id: batch.id })
      .update({ state: "published", published_by: userId, published_at: trx.fn.now(), updated_at: trx.fn.now() });
    await writeAudit(
      {
        vendorId,
        actorUserId: userId,
        action: "family.publish",
        objectType: "family_batch",
        objectId: batch.id,
        details: { family: slug, batch: number, sheets: items.length, excluded: excluded.length },
      },
      trx,
    );
    await enqueue(trx, FAMILY_ALERTS_QUEUE, { vendorId, batchId: batch.id }, { key: `family-alerts:${batch.id}`, expireInSeconds: 3600 });
    return { published: items.length, returned: excluded.length };
  });
}
