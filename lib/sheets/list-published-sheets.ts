import "server-only";

import { db } from "@/lib/db/knex";

export type PublishedSheetSummary = {
  slug: string;
  title: string;
  number: number;
  publishedAt: Date;
  cutterSku: string;
  cutterName: string;
  diameterMm: number;
  flutes: number;
  materialName: string;
  machineClassName: string;
};

export async function listPublishedSheets({ vendorId, limit = 200 }: { vendorId: string; limit?: number }): Promise<PublishedSheetSummary[]> {
  const rows = await db("sheet_versions as v")
    .join("sheets as s", function () {
      this.on("s.id", "v.sheet_id").andOn("s.vendor_id", "v.vendor_id");
    })
    .join("cutters as c", "c.id", "s.cutter_id")
    .join("materials as m", "m.id", "s.material_id")
    .join("machine_classes as k", "k.id", "s.machine_class_id")
    .where({ "v.vendor_id": vendorId, "v.state": "published" })
    .orderBy([{ column: "m.name" }, { column: "c.diameter_mm" }])
    .limit(limit)
    .select("s.slug", "v.title", "v.number", "v.published_at", "c.sku", "c.name as cutter_name", "c.diameter_mm", "c.flutes", "m.name as material_name", "k.name as class_name");
  return rows.map((r) => ({
    slug: r.slug,
    title: r.title,
    number: r.number,
    publishedAt: r.published_at,
    cutterSku: r.sku,
    cutterName: r.cutter_name,
    diameterMm: r.diameter_mm,
    flutes: r.flutes,
    materialName: r.material_name,
    machineClassName: r.class_name,
  }));
}
