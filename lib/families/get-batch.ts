import "server-only";

import type { Knex } from "knex";

import type { BatchItemOutcome, BatchState } from "@/content-schema/family";
import { db } from "@/lib/db/knex";
import type { FamilyBatchRow } from "@/lib/db/tables";
import { NotFound } from "@/lib/errors/domain-errors";

export type Batch = {
  id: string;
  familyId: string;
  number: number;
  state: BatchState;
  total: number;
  done: number;
  ruleVersion: number;
  error: string | null;
  createdBy: string | null;
  createdByName: string | null;
  approvedByName: string | null;
  approvedAt: Date | null;
  publishedAt: Date | null;
  createdAt: Date;
};

const columns = [
  "b.id",
  "b.family_id",
  "b.number",
  "b.state",
  "b.total",
  "b.done",
  "b.error",
  "b.created_by",
  "b.approved_at",
  "b.published_at",
  "b.created_at",
  "r.number as rule_version",
  "cu.name as created_by_name",
  "au.name as approved_by_name",
];

/** A batch row with its rules version and the names of the people who made and approved it. */
type BatchWithNamesRow = Pick<
  FamilyBatchRow,
  "id" | "family_id" | "number" | "state" | "total" | "done" | "error" | "created_by" | "approved_at" | "published_at" | "created_at"
> & { rule_version: number; created_by_name: string | null; approved_by_name: string | null };

const baseQuery = (trx: Knex, vendorId: string) =>
  trx("family_batches as b")
    .join("family_rule_sets as r", function () {
      this.on("r.id", "b.rule_set_id").andOn("r.vendor_id", "b.vendor_id");
    })
    .leftJoin("users as cu", "cu.id", "b.created_by")
    .leftJoin("users as au", "au.id", "b.approved_by")
    .where("b.vendor_id", vendorId);

const rowToBatch = (r: BatchWithNamesRow): Batch => ({
  id: r.id,
  familyId: r.family_id,
  number: r.number,
  state: r.state,
  total: r.total,
  done: r.done,
  ruleVersion: r.rule_version,
  error: r.error,
  createdBy: r.created_by,
  createdByName: r.created_by_name,
  approvedByName: r.approved_by_name,
  approvedAt: r.approved_at,
  publishedAt: r.published_at,
  createdAt: r.created_at,
});

export async function listBatches({ vendorId, familyId }: { vendorId: string; familyId: string }): Promise<Batch[]> {
  return (
    await baseQuery(db, vendorId).where("b.family_id", familyId).orderBy("b.number", "desc").select<BatchWithNamesRow[]>(columns)
  ).map(rowToBatch);
}

export async function getBatch({
  vendorId,
  familyId,
  number,
  trx = db,
}: {
  vendorId: string;
  familyId: string;
  number: number;
  trx?: Knex;
}): Promise<Batch> {
  const row = await baseQuery(trx, vendorId)
    .where({ "b.family_id": familyId, "b.number": number })
    .first<BatchWithNamesRow | undefined>(columns);
  if (!row) throw new NotFound("No such batch.");
  return rowToBatch(row);
}

/** Cells per outcome, and how many of the written ones the reviewer left out. */
export async function countBatchItems({ vendorId, batchId }: { vendorId: string; batchId: string }) {
  const rows = await db("family_batch_items")
    .where({ vendor_id: vendorId, batch_id: batchId })
    .groupBy("outcome")
    .select<{ outcome: BatchItemOutcome; n: number; excluded: number }[]>(
      "outcome",
      db.raw("count(*)::int as n"),
      db.raw("count(excluded_reason)::int as excluded"),
    );
  const counts: Record<BatchItemOutcome | "excluded", number> = {
    created: 0,
    "new-version": 0,
    unchanged: 0,
    blocked: 0,
    busy: 0,
    excluded: 0,
  };
  for (const r of rows) {
    counts[r.outcome] = r.n;
    counts.excluded += r.excluded;
  }
  return counts;
}
