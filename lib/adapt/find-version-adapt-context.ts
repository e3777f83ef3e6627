import "server-only";

import type { Knex } from "knex";

import { db } from "@/lib/db/knex";
import { joinSheetCatalogue } from "@/lib/sheets/join-sheet-catalogue";

import type { AdaptContext } from "./adapt-context";
import { readStoredCautions, readStoredOperations, toContextOperation } from "./read-front-matter";

const nullableNumber = (value: unknown) => (value === null || value === undefined ? null : Number(value));
const hasMeltingCaution = (cautions: unknown) =>
  Array.isArray(cautions) && cautions.some((c) => (c as { kind?: unknown })?.kind === "melting");

const READABLE = ["published", "superseded", "withdrawn"];

/** The sheet-derived engine inputs of one readable version, built from its front matter and catalogue rows. */
export async function findVersionAdaptContext({
  vendorId,
  versionId,
  trx = db,
}: {
  vendorId: string;
  versionId: string;
  trx?: Knex;
}): Promise<AdaptContext | null> {
  const row = await joinSheetCatalogue(trx("sheet_versions as v"))
    .where({ "v.vendor_id": vendorId, "v.id": versionId })
    .whereIn("v.state", READABLE)
    .first(
      "v.id",
      "v.number",
      "v.state",
      "v.title",
      "v.front_matter",
      "s.slug",
      "c.sku",
      "c.name as cutter_name",
      "c.diameter_mm",
      "c.flutes",
      "c.corner_form",
      "c.corner_radius_mm",
      "c.flute_length_mm",
      "c.tool_material",
      "m.name as material_name",
      "m.vc_min_mpm",
      "m.vc_max_mpm",
      "m.min_chip_load_mm",
      "m.kc_nmm2",
      "m.chip_load_min_pct_d",
      "m.chip_load_max_pct_d",
      "m.kc11_nmm2",
      "m.mc",
      "m.cautions as material_cautions",
      "k.name as class_name",
      "k.rigidity",
      "k.rpm_min",
      "k.rpm_max",
      "k.max_feed_mm_min",
      "k.z_thrust_n",
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
    cutter: {
      sku: row.sku,
      name: row.cutter_name,
      diameterMm: d,
      flutes: Number(row.flutes),
      cornerRadiusMm,
      cornerForm: row.corner_form,
      fluteLengthMm: nullableNumber(row.flute_length_mm),
      toolMaterial: row.tool_material,
    },
    material: {
      name: row.material_name,
      vcMinMpm: Number(row.vc_min_mpm),
      vcMaxMpm: Number(row.vc_max_mpm),
      minChipLoadMm: Number(row.min_chip_load_mm),
      kcNmm2: Number(row.kc_nmm2),
      chipLoadMinPctD: Number(row.chip_load_min_pct_d),
      chipLoadMaxPctD: Number(row.chip_load_max_pct_d),
      kc11Nmm2: nullableNumber(row.kc11_nmm2),
      mc: nullableNumber(row.mc),
      meltsWhenRubbing: hasMeltingCaution(row.material_cautions),
    },
    referenceMachine: {
      name: row.class_name,
      rigidity: Number(row.rigidity),
      rpmMin: Number(row.rpm_min),
      rpmMax: Number(row.rpm_max),
      maxFeedMmMin: Number(row.max_feed_mm_min),
      zThrustN: nullableNumber(row.z_thrust_n),
    },
    operations: readStoredOperations(row.front_matter).map((op, i) => toContextOperation(op, i, d)),
    cautions: readStoredCautions(row.front_matter),
  };
}
