import "server-only";

import type { Knex } from "knex";

import { db } from "@/lib/db/knex";
import { joinSheetCatalogue } from "@/lib/sheets/join-sheet-catalogue";

import type { AdaptContext } from "./adapt-context";
import { readStoredCautions, readStoredOperations, toContextOperation } from "./read-front-matter";

const READABLE = ["published", "superseded", "withdrawn"];

/** The sheet-derived engine inputs of one readable version, built from its front matter and catalogue rows. */
export async function loadAdaptContext({ vendorId, versionId, trx = db }: { vendorId: string; versionId: string; trx?: Knex }): Promise<AdaptContext | null> {
  const row = await joinSheetCatalogue(trx("sheet_versions as v"))
    .where({ "v.vendor_id": vendorId, "v.id": versionId })
    .whereIn("v.state", READABLE)
    .first(
      "v.id", "v.number", "v.state", "v.title", "v.front_matter", "s.slug",
      "c.sku", "c.name as cutter_name", "c.diameter_mm", "c.flutes", "c.corner_form", "c.corner_radius_mm", "c.tool_material",
      "m.name as material_name", "m.vc_min_mpm", "m.vc_max_mpm", "m.min_chip_load_mm", "m.kc_nmm2",
      "k.name as class_name", "k.rigidity", "k.rpm_min", "k.rpm_max",
    );
  if (!row) return null;
  const d = Number(row.diameter_mm);
  const cornerRadiusMm = row.corner_form === "ball" ? d / 2 : row.corner_radius_mm === null ? null : Number(row.corner_radius_mm);
  return {
    versionId: row.id,
    versionNumber: row.number,
    versionState: row.state,
    sheetSlug: row.slug,
    title: row.title,
    cutter: { sku: row.sku, name: row.cutter_name, diameterMm: d, flutes: Number(row.flutes), cornerRadiusMm, toolMaterial: row.tool_material },
    material: { name: row.material_name, vcMinMpm: Number(row.vc_min_mpm), vcMaxMpm: Number(row.vc_max_mpm), minChipLoadMm: Number(row.min_chip_load_mm), kcNmm2: Number(row.kc_nmm2) },
    referenceMachine: { name: row.class_name, rigidity: Number(row.rigidity), rpmMin: Number(row.rpm_min), rpmMax: Number(row.rpm_max) },
    operations: readStoredOperations(row.front_matter).map((op, i) => toContextOperation(op, i, d)),
    cautions: readStoredCautions(row.front_matter),
  };
}
