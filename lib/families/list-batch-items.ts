import "server-only";

import type { SheetFrontMatter } from "@/content-schema/sheet-front-matter";
import { readStoredOperations } from "@/lib/adapt/read-front-matter";
import { db } from "@/lib/db/knex";
import { diffParameters, type OperationDiff } from "@/lib/sheets/parameter-diff";

export type BatchItem = {
  id: string;
  outcome: string;
  sku: string;
  materialName: string;
  className: string;
  slug: string | null;
  versionNumber: number | null;
  versionState: string | null;
  previousNumber: number | null;
  excludedReason: string | null;
  warnings: { operation: string; code: string; message: string }[];
  provenance: { label: string; rules: string[] }[];
  diff: OperationDiff[];
};

const fm = (raw: unknown): SheetFrontMatter => ({ ...(raw as SheetFrontMatter), operations: readStoredOperations(raw) });

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
    .select(
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
    const after = written ? fm(r.front_matter) : null;
    const before = r.previous_fm ? fm(r.previous_fm) : after ? { ...after, operations: [] } : null;
    return {
      id: r.id,
      outcome: r.outcome,
      sku: r.sku,
      materialName: r.material_name,
      className: r.class_name,
      slug: r.slug ?? null,
      versionNumber: r.number ?? null,
      versionState: r.state ?? null,
      previousNumber: r.previous_number ?? null,
      excludedReason: r.excluded_reason ?? null,
      warnings: r.warnings ?? [],
      provenance: r.provenance ?? [],
      diff: after && before ? diffParameters(before, after, { flutes: Number(r.flutes), diameterMm: Number(r.diameter_mm) }) : [],
    };
  });
}
