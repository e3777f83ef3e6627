import "server-only";

import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { Conflict, Forbidden } from "@/lib/errors/domain-errors";
import { approveDraftIn } from "@/lib/sheets/approve-draft";
import { getVendorSettings } from "@/lib/vendors/vendor-settings";

import { includedItems, lockBatch, onSheet } from "./lock-batch";

/**
 * A second engineer approves every sheet the batch wrote and the reviewer kept, through the same approval as a
 * single sheet (so the author of the batch cannot approve it); one transaction, all or none.
 */
export async function approveBatch({ vendorId, userId, slug, number }: { vendorId: string; userId: string; slug: string; number: number }) {
  const settings = await getVendorSettings(vendorId);
  return db.transaction(async (trx) => {
    const { batch } = await lockBatch(trx, { vendorId, slug, number, state: "in_review" });
    if (settings.requireSecondApproval && batch.createdBy === userId)
      throw new Forbidden("You generated this batch; an engineer other than you must review it.");
    const items = await includedItems(trx, vendorId, batch.id);
    if (!items.length) throw new Conflict("Nothing in this batch to approve: every written sheet was left out, or none was written.");
    for (const item of items) await onSheet(item.slug, () => approveDraftIn(trx, { vendorId, userId, slug: item.slug, settings }));
    await trx("family_batches")
      .where({ vendor_id: vendorId, id: batch.id })
      .update({ state: "approved", approved_by: userId, approved_at: trx.fn.now(), updated_at: trx.fn.now() });
    await writeAudit(
      {
        vendorId,
        actorUserId: userId,
        action: "family.approve",
        objectType: "family_batch",
        objectId: batch.id,
        details: { family: slug, batch: number, sheets: items.length },
      },
      trx,
    );
    return { approved: items.length };
  });
}
