import "server-only";

import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { InvalidInput, NotFound } from "@/lib/errors/domain-errors";

import { lockBatch } from "./lock-batch";

/** The reviewer leaves one written sheet out of the batch, with a reason; it goes back to draft when the batch is published. */
export async function excludeBatchItem({
  vendorId,
  userId,
  slug,
  number,
  itemId,
  reason,
}: {
  vendorId: string;
  userId: string;
  slug: string;
  number: number;
  itemId: string;
  reason: string;
}) {
  const why = reason.trim();
  if (why.length < 3)
    throw new InvalidInput("Say why this sheet is left out.", { reason: ["Say why this sheet is left out (at least 3 characters)."] });
  return db.transaction(async (trx) => {
    const { batch } = await lockBatch(trx, { vendorId, slug, number, state: "in_review" });
    const updated = await trx("family_batch_items")
      .where({ vendor_id: vendorId, batch_id: batch.id, id: itemId })
      .whereIn("outcome", ["created", "new-version"])
      .update({ excluded_reason: why, excluded_by: userId })
      .returning("id");
    if (!updated.length) throw new NotFound("No such sheet in this batch.");
    await writeAudit(
      {
        vendorId,
        actorUserId: userId,
        action: "family.exclude",
        objectType: "family_batch",
        objectId: batch.id,
        details: { family: slug, batch: number, item: itemId, reason: why },
      },
      trx,
    );
    return { excluded: true };
  });
}
