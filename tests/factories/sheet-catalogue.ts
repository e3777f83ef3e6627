import { db } from "@/lib/db/knex";

import { uniq } from "./foundation";

// Invented demo data. Cutter 3.175 mm, 1 flute; cast acrylic vc 150–300 m/min, min fz 0.05 mm, kc 100 N/mm², a chip-load
// band of 1.2–3.5 % of D (the vendor's own, wider than the plastics default, so the slot's 0.1 mm sits inside it);
// reference class "Rigid router" 8000–24 000 rpm, 2.2 kW, rigidity 0.8. Tests compute expected numbers from these.

/** A cutter, a material, a machine class and a sheet joining them (no version yet). */
export async function insertSheetCatalogue(vendorId: string, authorId: string | null = null) {
  const [cutter] = await db("cutters")
    .insert({
      vendor_id: vendorId,
      sku: uniq("SF"),
      name: "Single-flute O-flute 1/8 in",
      diameter_mm: 3.175,
      flutes: 1,
      flute_length_mm: 12,
      overall_length_mm: 38,
      shank_mm: 3.175,
      geometry: "o-flute",
      short_code: uniq("c"),
    })
    .returning(["id", "sku", "short_code"]);
  const [material] = await db("materials")
    .insert({
      vendor_id: vendorId,
      slug: uniq("acrylic"),
      name: "Cast acrylic",
      material_group: "plastics",
      vc_min_mpm: 150,
      vc_max_mpm: 300,
      min_chip_load_mm: 0.05,
      kc_nmm2: 100,
      chip_load_min_pct_d: 1.2,
      chip_load_max_pct_d: 3.5,
    })
    .returning("id");
  const [machineClass] = await db("machine_classes")
    .insert({
      vendor_id: vendorId,
      slug: uniq("router"),
      name: "Rigid router",
      rpm_min: 8000,
      rpm_max: 24000,
      power_kw: 2.2,
      max_feed_mm_min: 10000,
      rigidity: 0.8,
    })
    .returning("id");
  const [sheet] = await db("sheets")
    .insert({
      vendor_id: vendorId,
      slug: uniq("sheet"),
      cutter_id: cutter.id,
      material_id: material.id,
      machine_class_id: machineClass.id,
      created_by: authorId,
    })
    .returning(["id", "slug"]);
  return {
    cutter: cutter as { id: string; sku: string; short_code: string },
    materialId: material.id as string,
    sheet: sheet as { id: string; slug: string },
  };
}
