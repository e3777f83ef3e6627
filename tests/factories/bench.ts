import { sheetFrontMatterSchema } from "@/content-schema/sheet-front-matter";
import { db } from "@/lib/db/knex";
import { mustExist } from "@/tests/support/must-exist";

import { insertSheetCatalogue } from "./sheet-catalogue";
import { buildSheetSource, frontMatterInput, operationInput } from "./sheet-source";

// Invented demo data on the catalogue of ./sheet-catalogue.ts. Slot op: n 18 000 rpm, vf 1800 mm/min (fz = 0.1 mm), ap 1.5 mm, ae 100 %.

export async function createBenchSheet(vendorId: string) {
  const { cutter, sheet } = await insertSheetCatalogue(vendorId);
  const v1 = await insertVersion(vendorId, sheet.id, 1, {});
  return { sheetId: sheet.id, sheetSlug: sheet.slug, cutterSku: cutter.sku, shortCode: cutter.short_code, versionId: v1 };
}

async function insertVersion(vendorId: string, sheetId: string, number: number, slot: Record<string, unknown>, changeNote = "") {
  const fields = frontMatterInput({
    operations: [
      operationInput(slot),
      operationInput({ kind: "profile", label: "Outside profile", ae: "0.5 mm", ap: "3 mm", entry: "none", rampAngleDeg: undefined }),
    ],
  });
  const frontMatter = sheetFrontMatterSchema.parse(fields);
  const [version] = await db("sheet_versions")
    .insert({
      vendor_id: vendorId,
      sheet_id: sheetId,
      number,
      state: "published",
      title: frontMatter.title,
      source: buildSheetSource({ frontMatter: fields }),
      front_matter: JSON.stringify(frontMatter),
      change_note: changeNote,
      published_at: db.fn.now(),
    })
    .returning("id");
  return version.id as string;
}

/** Supersedes the published version with a new one whose slot runs at another feed; returns the event to deliver. */
export async function supersede(vendorId: string, sheetId: string, slot: Record<string, unknown> = { vf: "1440 mm/min" }) {
  const old = mustExist(
    await db("sheet_versions").where({ vendor_id: vendorId, sheet_id: sheetId, state: "published" }).first("id", "number"),
    "old",
  );
  await db("sheet_versions").where({ id: old.id }).update({ state: "superseded", superseded_at: db.fn.now() });
  const versionId = await insertVersion(vendorId, sheetId, old.number + 1, slot, "Slot feed lowered after chatter reports.");
  return { type: "version.published" as const, vendorId, sheetId, versionId, supersededVersionId: old.id as string };
}

/** A weak desk router: 16 000 rpm top speed, 0.8 kW, 3000 mm/min, light frame. */
export const weakMachineFields = {
  name: "Desk router",
  rpmMin: "10000",
  rpmMax: "16000",
  powerKw: "0.8",
  maxFeedMmMin: "3000 mm/min",
  rigidity: "light",
  stickoutMm: "15 mm",
  units: "metric",
};
