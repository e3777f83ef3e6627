import "server-only";

import type { Knex } from "knex";

import type { BatchState } from "@/content-schema/family";
import { Conflict, DomainError, Forbidden, NotFound } from "@/lib/errors/domain-errors";

import { getBatch } from "./get-batch";
import { getFamily } from "./get-family";

/** Locks a batch row (serialising review steps) and checks it is in the state the step needs. */
export async function lockBatch(
  trx: Knex.Transaction,
  { vendorId, slug, number, state }: { vendorId: string; slug: string; number: number; state: BatchState },
) {
  const family = await getFamily({ vendorId, slug, trx });
  const batch = await getBatch({ vendorId, familyId: family.id, number, trx });
  const locked = await trx("family_batches").where({ vendor_id: vendorId, id: batch.id }).forUpdate().first("state");
  if (!locked) throw new NotFound("No such batch.");
  if (locked.state !== state)
    throw new Conflict(`Batch ${number} is ${locked.state.replace("_", " ")}; this step needs it ${state.replace("_", " ")}.`);
  return { family, batch };
}

/** The sheets a batch wrote that the reviewer kept, with their slugs. */
export async function includedItems(trx: Knex.Transaction, vendorId: string, batchId: string) {
  return trx("family_batch_items as i")
    .join("sheets as s", function () {
      this.on("s.id", "i.sheet_id").andOn("s.vendor_id", "i.vendor_id");
    })
    .where({ "i.vendor_id": vendorId, "i.batch_id": batchId })
    .whereIn("i.outcome", ["created", "new-version"])
    .whereNull("i.excluded_reason")
    .orderBy("s.slug")
    .select<{ id: string; version_id: string; slug: string }[]>("i.id", "i.version_id", "s.slug");
}

/** A step on one sheet of a batch failed: say which sheet, and roll the whole step back. */
export async function onSheet<T>(slug: string, step: () => Promise<T>): Promise<T> {
  try {
    return await step();
  } catch (error) {
    if (error instanceof Forbidden) throw new Forbidden(`${slug}: ${error.message}`);
    if (error instanceof DomainError) throw new Conflict(`${slug}: ${error.message}`);
    throw error;
  }
}
