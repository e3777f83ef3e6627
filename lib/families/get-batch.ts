import "server-only";

import type { Knex } from "knex";

import { db } from "@/lib/db/knex";
import { NotFound } from "@/lib/errors/domain-errors";

export type BatchState = "generating" | "in_review" | "approved" | "published" | "failed";
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

const baseQuery = (trx: Knex, vendorId: string) =>
  trx("family_batches as b")
    .join("family_rule_sets as r", function () {
      this.on("r.id", "b.rule_set_id").andOn("r.vendor_id", "b.vendor_id");
    })
    .leftJoin("users as cu", "cu.id", "b.created_by")
    .leftJoin("users as au", "au.id", "b.approved_by")
    .where("b.vendor_id", vendorId);

const rowToBatch = (r: Record<string, unknown>): Batch => ({
  id: String(r.id),
  familyId: String(r.family_id),
  number: Number(r.number),
  state: r.state as BatchState,
  total: Number(r.total),
  done: Number(r.done),
  ruleVersion: Number(r.rule_version),
  error: (r.error as string | null) ?? null,
  createdBy: (r.created_by as string | null) ?? null,
  createdByName: (r.created_by_name as string | null) ?? null,
  approvedByName: (r.approved_by_name as string | null) ?? null,
  approvedAt: (r.approved_at as Date | null) ?? null,
  publishedAt: (r.published_at as Date | null) ?? null,
  createdAt: r.created_at as Date,
});

export async function listBatches({ vendorId, familyId }: { vendorId: string; familyId: string }): Promise<Batch[]> {
  return (await baseQuery(db, vendorId).where("b.family_id", familyId).orderBy("b.number", "desc").select(columns)).map(rowToBatch);
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
  const row = await baseQuery(trx, vendorId).where({ "b.family_id": familyId, "b.number": number }).first(columns);
  if (!row) throw new NotFound("No such batch.");
  return rowToBatch(row);
}

/** Cells per outcome, and how many of the written ones the reviewer left out. */
export async function countBatchItems({ vendorId, batchId }: { vendorId: string; batchId: string }) {
  const rows = await db("family_batch_items")
    .where({ vendor_id: vendorId, batch_id: batchId })
    .groupBy("outcome")
    .select("outcome", db.raw("count(*)::int as n"), db.raw("count(excluded_reason)::int as excluded"));
  const counts: Record<string, number> = { created: 0, "new-version": 0, unchanged: 0, blocked: 0, busy: 0, excluded: 0 };
  for (const r of rows) {
    counts[r.outcome] = r.n;
    counts.excluded += r.excluded;
  }
  return counts;
}
