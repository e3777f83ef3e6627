import "server-only";

import type { Knex } from "knex";

import { readDb } from "@/lib/db/read-db";

export type PublishedSheetSummary = {
  slug: string;
  /** The current published version's id (for adapting it on the Bench). */
  versionId: string;
  title: string;
  summary: string;
  number: number;
  publishedAt: Date;
  cutterId: string;
  cutterSku: string;
  cutterName: string;
  diameterMm: number;
  flutes: number;
  materialSlug: string;
  materialName: string;
  machineClassId: string;
  machineClassSlug: string;
  machineClassName: string;
};

/** `cutterIds` and `machineClassIds` narrow to those ids (an empty list finds nothing): "fits my shop". */
export type LibraryFilters = {
  cutter?: string;
  material?: string;
  machineClass?: string;
  cutterIds?: string[];
  machineClassIds?: string[];
};

/**
 * Current published versions, optionally narrowed to one cutter (SKU), material or machine class (slugs).
 * `from`: the connection to read (default readDb(); the Library's cache entries read the primary).
 */
export async function listPublishedSheets({
  vendorId,
  limit = 500,
  filters = {},
  from,
}: {
  vendorId: string;
  limit?: number;
  filters?: LibraryFilters;
  from?: Knex;
}): Promise<PublishedSheetSummary[]> {
  const db = from ?? (await readDb());
  const query = db("sheet_versions as v")
    .join("sheets as s", function () {
      this.on("s.id", "v.sheet_id").andOn("s.vendor_id", "v.vendor_id");
    })
    .join("cutters as c", "c.id", "s.cutter_id")
    .join("materials as m", "m.id", "s.material_id")
    .join("machine_classes as k", "k.id", "s.machine_class_id")
    .where({ "v.vendor_id": vendorId, "v.state": "published" });
  if (filters.cutter) query.whereRaw("lower(c.sku) = lower(?)", [filters.cutter]);
  if (filters.material) query.where("m.slug", filters.material);
  if (filters.machineClass) query.where("k.slug", filters.machineClass);
  if (filters.cutterIds) query.whereIn("c.id", filters.cutterIds);
  if (filters.machineClassIds) query.whereIn("k.id", filters.machineClassIds);
  const rows = await query
    .orderBy([{ column: "m.name" }, { column: "c.diameter_mm" }, { column: "s.slug" }])
    .limit(limit)
    .select(
      "s.slug",
      "v.id as version_id",
      "c.id as cutter_id",
      "k.id as class_id",
      "v.title",
      "v.front_matter",
      "v.number",
      "v.published_at",
      "c.sku",
      "c.name as cutter_name",
      "c.diameter_mm",
      "c.flutes",
      "m.slug as material_slug",
      "m.name as material_name",
      "k.slug as class_slug",
      "k.name as class_name",
    );
  return rows.map((r) => ({
    slug: r.slug,
    versionId: r.version_id,
    title: r.title,
    summary: typeof r.front_matter?.summary === "string" ? r.front_matter.summary : "",
    number: r.number,
    publishedAt: r.published_at,
    cutterId: r.cutter_id,
    cutterSku: r.sku,
    cutterName: r.cutter_name,
    diameterMm: r.diameter_mm,
    flutes: r.flutes,
    materialSlug: r.material_slug,
    materialName: r.material_name,
    machineClassId: r.class_id,
    machineClassSlug: r.class_slug,
    machineClassName: r.class_name,
  }));
}
