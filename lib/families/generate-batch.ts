import "server-only";

import { z } from "zod";

import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { DEFAULT_JOB_OPTIONS } from "@/lib/jobs/enqueue";
import type { JobMeta } from "@/lib/jobs/job-meta";

import { listCellSheets } from "./cell-sheets";
import { computeCell, eachCell } from "./compute-cells";
import { rowToFamily } from "./family-rows";
import { getRuleSet } from "./get-family";
import { getFamilyCatalogue } from "./get-family-catalogue";
import { writeCells } from "./write-cells";

const jobSchema = z.object({ vendorId: z.uuid(), batchId: z.uuid() });
const CHUNK = 250;

/**
 * Generates a batch a chunk at a time, each chunk in its own transaction with the batch's progress. Cells
 * already written (an item exists) are skipped, so a retried job carries on where the last attempt stopped.
 */
export async function generateBatch({ vendorId, batchId, chunkSize = CHUNK }: { vendorId: string; batchId: string; chunkSize?: number }) {
  const batch = await db("family_batches").where({ vendor_id: vendorId, id: batchId }).first();
  if (!batch || batch.state !== "generating") return { written: 0 };
  const familyRow = await db("families").where({ vendor_id: vendorId, id: batch.family_id }).first();
  // A family's batches go with it (on delete cascade): no family, no batch to write.
  if (!familyRow) return { written: 0 };
  const family = rowToFamily(familyRow);
  const ruleSet = await getRuleSet({ vendorId, id: batch.rule_set_id });
  const catalogue = await getFamilyCatalogue({ vendorId, family });
  const sheets = await listCellSheets({
    vendorId,
    cutterIds: catalogue.cutters.map((c) => c.id),
    materialIds: family.materialIds,
    machineClassIds: family.machineClassIds,
  });
  const doneRows = await db("family_batch_items")
    .where({ vendor_id: vendorId, batch_id: batchId })
    .select("cutter_id", "material_id", "machine_class_id");
  const done = new Set(doneRows.map((r) => `${r.cutter_id}:${r.material_id}:${r.machine_class_id}`));
  const info = {
    vendorId,
    batchId,
    batchNumber: batch.number,
    userId: batch.created_by,
    familyName: family.name,
    ruleVersion: ruleSet.number,
  };
  let written = 0;
  let chunk: ReturnType<typeof computeCell>[] = [];
  const flush = async () => {
    if (!chunk.length) return;
    const cells = chunk;
    chunk = [];
    await db.transaction(async (trx) => {
      const statuses = await writeCells(trx, info, cells, sheets);
      written += statuses.filter((s) => s === "new" || s === "changed").length;
      await trx("family_batches")
        .where({ vendor_id: vendorId, id: batchId })
        .update({ done: trx.raw("done + ?", [cells.length]), updated_at: trx.fn.now() });
    });
  };
  for (const cell of eachCell(catalogue)) {
    if (done.has(`${cell.cutter.id}:${cell.material.id}:${cell.machineClass.id}`)) continue;
    chunk.push(computeCell(cell, ruleSet.rules));
    if (chunk.length >= chunkSize) await flush();
  }
  await flush();
  await db.transaction(async (trx) => {
    const counts = await trx("family_batch_items")
      .where({ vendor_id: vendorId, batch_id: batchId })
      .count<{ count: string }[]>("id as count");
    await trx("family_batches")
      .where({ vendor_id: vendorId, id: batchId, state: "generating" })
      .update({ state: "in_review", done: Number(counts[0].count), total: Number(counts[0].count), updated_at: trx.fn.now() });
    await writeAudit(
      {
        vendorId,
        actorUserId: batch.created_by,
        action: "family.generate",
        objectType: "family_batch",
        objectId: batchId,
        details: { family: family.slug, batch: batch.number, ruleVersion: ruleSet.number },
      },
      trx,
    );
  });
  return { written };
}

/** The job: a batch whose last attempt failed is marked failed (with the reason for staff), so a new batch can start. */
export async function generateBatchJob(data: unknown, job?: JobMeta): Promise<void> {
  const input = jobSchema.parse(data);
  try {
    await generateBatch(input);
  } catch (error) {
    if (job && job.retryCount >= DEFAULT_JOB_OPTIONS.retryLimit) {
      const reason = error instanceof Error ? error.message.slice(0, 500) : "unknown error";
      await db("family_batches")
        .where({ vendor_id: input.vendorId, id: input.batchId, state: "generating" })
        .update({ state: "failed", error: reason, updated_at: db.fn.now() });
    }
    throw error;
  }
}
