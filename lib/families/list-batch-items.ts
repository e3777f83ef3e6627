import "server-only";

import { z } from "zod";

import {
  cellProvenanceSchema,
  cellWarningSchema,
  type BatchItemOutcome,
  type CellProvenance,
  type CellWarning,
} from "@/content-schema/family";
import type { SheetState } from "@/content-schema/sheet-workflow";
import { db } from "@/lib/db/knex";
import type { FamilyBatchItemRow } from "@/lib/db/tables";
import { diffParameters, type OperationDiff } from "@/lib/sheets/parameter-diff";
import { storedFrontMatter } from "@/lib/sheets/version-rows";

export type BatchItem = {
  id: string;
  outcome: BatchItemOutcome;
  sku: string;
  materialName: string;
  className: string;
  slug: string | null;
  versionNumber: number | null;
  versionState: SheetState | null;
  previousNumber: number | null;
  excludedReason: string | null;
  warnings: CellWarning[];
  provenance: CellProvenance[];
  diff: OperationDiff[];
};

/** A batch item with its cell's catalogue names and the version it wrote and the one it replaces. */
type BatchItemJoinRow = Pick<FamilyBatchItemRow, "id" | "outcome" | "excluded_reason" | "warnings" | "provenance"> & {
  sku: string;
  diameter_mm: number;
  flutes: number;
  material_name: string;
  class_name: string;
  slug: string | null;
  number: number | null;
  state: SheetState | null;
  front_matter: unknown;
  previous_number: number | null;
  previous_fm: unknown;
};

const warningsSchema = z.array(cellWarningSchema);
const provenanceSchema = z.array(cellProvenanceSchema);

/** A page of a batch's cells for review, written sheets first, each with its parameter diff against the version it replaces. */
export async function listBatchItems({
  vendorId,
  batchId,
  outcome,
  limit = 200,
  offset = 0,
}: {
  vendorId: string;
  batchId: string;
  outcome?: string;
  limit?: number;
  offset?: number;
}): Promise<BatchItem[]> {
  const q = db("family_batch_items as i")
    .join("cutters as c", function () {
      this.on("c.id", "i.cutter_id").andOn("c.vendor_id", "i.vendor_id");
    })
    .join("materials as m", function () {
      this.on("m.id", "i.material_id").andOn("m.vendor_id", "i.vendor_id");
    })
    .join("machine_classes as k", function () {
      this.on("k.id", "i.machine_class_id").andOn("k.vendor_id", "i.vendor_id");
    })
    .leftJoin("sheets as s", function () {
      this.on("s.id", "i.sheet_id").andOn("s.vendor_id", "i.vendor_id");
    })
    .leftJoin("sheet_versions as v", function () {
      this.on("v.id", "i.version_id").andOn("v.vendor_id", "i.vendor_id");
    })
    .leftJoin("sheet_versions as p", function () {
      this.on("p.id", "i.previous_version_id").andOn("p.vendor_id", "i.vendor_id");
    })
    .where("i.vendor_id", vendorId)
    .andWhere("i.batch_id", batchId);
  if (outcome) q.andWhere("i.outcome", outcome);
  const rows = await q
    .orderByRaw(
      "case i.outcome when 'new-version' then 0 when 'created' then 1 when 'blocked' then 2 when 'busy' then 3 else 4 end, m.name, k.rpm_max, c.sku",
    )
    .limit(limit)
    .offset(offset)
    .select<BatchItemJoinRow[]>(
      "i.id",
      "i.outcome",
      "i.excluded_reason",
      "i.warnings",
      "i.provenance",
      "c.sku",
      "c.diameter_mm",
      "c.flutes",
      "m.name as material_name",
      "k.name as class_name",
      "s.slug",
      "v.number",
      "v.state",
      "v.front_matter",
      "p.number as previous_number",
      "p.front_matter as previous_fm",
    );
  return rows.map((r) => {
    const written = r.outcome === "created" || r.outcome === "new-version";
    const after = written ? storedFrontMatter(r.front_matter) : null;
    const before = storedFrontMatter(r.previous_fm) ?? (after ? { ...after, operations: [] } : null);
    return {
      id: r.id,
      outcome: r.outcome,
      sku: r.sku,
      materialName: r.material_name,
      className: r.class_name,
      slug: r.slug,
      versionNumber: r.number,
      versionState: r.state,
      previousNumber: r.previous_number,
      excludedReason: r.excluded_reason,
      warnings: warningsSchema.parse(r.warnings),
      provenance: provenanceSchema.parse(r.provenance),
      diff: after && before ? diffParameters(before, after, { flutes: r.flutes, diameterMm: r.diameter_mm }) : [],
    };
  });
}
