import { sheetFrontMatterSchema } from "@/content-schema/sheet-front-matter";
import { db } from "@/lib/db/knex";

import { uniq } from "./foundation";
import { buildSheetSource, frontMatterInput, operationInput } from "./sheet-source";

// Invented demo data. Cutter 3.175 mm, 1 flute; cast acrylic vc 150–300 m/min, min fz 0.05 mm, kc 100 N/mm²;
// reference class rigidity 0.8. Slot op: n 18 000 rpm, vf 1800 mm/min (fz = 0.1 mm), ap 1.5 mm, ae 100 %.

export async function createBenchSheet(vendorId: string) {
  const [cutter] = await db("cutters")
    .insert({ vendor_id: vendorId, sku: uniq("SF"), name: "Single-flute O-flute 1/8 in", diameter_mm: 3.175, flutes: 1, flute_length_mm: 12, overall_length_mm: 38, shank_mm: 3.175, geometry: "o-flute", short_code: uniq("c") })
    .returning(["id", "sku", "short_code"]);
  const [material] = await db("materials")
    .insert({ vendor_id: vendorId, slug: uniq("acrylic"), name: "Cast acrylic", material_group: "plastics", vc_min_mpm: 150, vc_max_mpm: 300, min_chip_load_mm: 0.05, kc_nmm2: 100 })
    .returning("id");
  const [machineClass] = await db("machine_classes")
    .insert({ vendor_id: vendorId, slug: uniq("router"), name: "Rigid router", rpm_min: 8000, rpm_max: 24000, power_kw: 2.2, max_feed_mm_min: 10000, rigidity: 0.8 })
    .returning("id");
  const [sheet] = await db("sheets")
    .insert({ vendor_id: vendorId, slug: uniq("sheet"), cutter_id: cutter.id, material_id: material.id, machine_class_id: machineClass.id })
    .returning(["id", "slug"]);
  const v1 = await insertVersion(vendorId, sheet.id, 1, {});
  return { sheetId: sheet.id as string, sheetSlug: sheet.slug as string, cutterSku: cutter.sku as string, shortCode: cutter.short_code as string, versionId: v1 };
}

async function insertVersion(vendorId: string, sheetId: string, number: number, slot: Record<string, unknown>, changeNote = "") {
  const fields = frontMatterInput({ operations: [operationInput(slot), operationInput({ kind: "profile", label: "Outside profile", ae: "0.5 mm", ap: "3 mm", entry: "none", rampAngleDeg: undefined })] });
  const frontMatter = sheetFrontMatterSchema.parse(fields);
  const [version] = await db("sheet_versions")
    .insert({ vendor_id: vendorId, sheet_id: sheetId, number, state: "published", title: frontMatter.title, source: buildSheetSource({ frontMatter: fields }), front_matter: JSON.stringify(frontMatter), change_note: changeNote, published_at: db.fn.now() })
    .returning("id");
  return version.id as string;
}

/** Supersedes the published version with a new one whose slot runs at another feed; returns the event to deliver. */
export async function supersede(vendorId: string, sheetId: string, slot: Record<string, unknown> = { vf: "1440 mm/min" }) {
  const old = await db("sheet_versions").where({ vendor_id: vendorId, sheet_id: sheetId, state: "published" }).first("id", "number");
  await db("sheet_versions").where({ id: old.id }).update({ state: "superseded", superseded_at: db.fn.now() });
  const versionId = await insertVersion(vendorId, sheetId, old.number + 1, slot, "Slot feed lowered after chatter reports.");
  return { type: "version.published" as const, vendorId, sheetId, versionId, supersededVersionId: old.id as string };
}

/** A weak desk router: 16 000 rpm top speed, 0.8 kW, 3000 mm/min, light frame. */
export const weakMachineFields = { name: "Desk router", rpmMin: "10000", rpmMax: "16000", powerKw: "0.8", maxFeedMmMin: "3000 mm/min", rigidity: "light", stickoutMm: "15 mm", units: "metric" };
