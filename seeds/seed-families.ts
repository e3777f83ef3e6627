// Invented demo data: one sheet family of Quillon's, a new O-flute plastics series brought to market across three
// machine classes, with its batch history: rules version 1 generated and published (cells the engine warns about
// blocked, so no demo sheet shows a warned number), rules version 2 generated and waiting for a second engineer.
import type { Knex } from "knex";

import { cutterFieldsSchema } from "@/content-schema/catalogue-cutter";
import { familyRulesSchema, type FamilyRulesInput } from "@/content-schema/family";
import { cutterToRow, rowToCutter, rowToMachineClass, rowToMaterial } from "@/lib/catalogue/catalogue-rows";
import { listCellSheets } from "@/lib/families/cell-sheets";
import { computeCell, eachCell } from "@/lib/families/compute-cells";
import { writeCells } from "@/lib/families/write-cells";

import type { SeededIds } from "./seed-foundation";

const VENDOR = "quillon";
const SERIES = [2, 3.175, 4, 5].map((d, i) => ({
  sku: `QC-P1-${String(i + 1).padStart(2, "0")}`,
  name: `${d} mm O-flute plastic finisher`,
  diameterMm: d,
  flutes: 1,
  fluteLengthMm: Math.round(d * 3 * 10) / 10,
  overallLengthMm: 50,
  shankMm: Math.max(3.175, d),
  geometry: "o-flute",
  helixDeg: 21,
  coating: "polished",
  notes: "Invented demo cutter (sheet family series).",
}));
const RULES_V1: FamilyRulesInput = { kinds: ["slotting", "profile"], rules: [] };
// Version 2: profiles in plastics on the light router go a little deeper (1·D), slots run the chip higher in the band.
const RULES_V2: FamilyRulesInput = {
  kinds: ["slotting", "profile"],
  rules: [
    { materialGroup: "plastics", kind: "slotting", chipLoadPosition: 0.5 },
    { materialGroup: "plastics", kind: "profile", machineClass: "light-router", apPerD: 1, aePerD: 0.2 },
  ],
};

type FamilyRef = { vendorId: string; id: string; name: string; materialIds: string[]; machineClassIds: string[] };

/** The same chunk writer as the generation job, on the seed's connection. */
async function generate(
  knex: Knex,
  batch: { id: string; number: number },
  family: FamilyRef,
  rules: FamilyRulesInput,
  ruleVersion: number,
  catalogue: Parameters<typeof eachCell>[0],
  userId: string,
) {
  const { vendorId } = family;
  const parsed = familyRulesSchema.parse(rules);
  const cells = [...eachCell(catalogue)].map((cell) => computeCell(cell, parsed));
  const sheets = await listCellSheets({
    vendorId,
    cutterIds: catalogue.cutters.map((c) => c.id),
    materialIds: family.materialIds,
    machineClassIds: family.machineClassIds,
    trx: knex,
  });
  await knex.transaction((trx) =>
    writeCells(
      trx,
      { vendorId, batchId: batch.id, batchNumber: batch.number, userId, familyName: family.name, ruleVersion },
      cells,
      sheets,
    ),
  );
  await knex("family_batches").where({ id: batch.id }).update({ done: cells.length, total: cells.length });
}

export async function seedFamilies(knex: Knex, { vendors, users }: SeededIds) {
  const vendorId = vendors[VENDOR];
  const author = users[`eng1@${VENDOR}.test`];
  const reviewer = users[`eng2@${VENDOR}.test`];
  for (const c of SERIES)
    await knex("cutters").insert({
      ...cutterToRow(cutterFieldsSchema.parse(c)),
      vendor_id: vendorId,
      short_code: c.sku.toLowerCase().replace(/[^a-z0-9]/g, ""),
    });
  const cutters = (await knex("cutters").where({ vendor_id: vendorId }).whereLike("sku", "QC-P1-%").orderBy("sku")).map(rowToCutter);
  const materials = (
    await knex("materials").where({ vendor_id: vendorId }).whereIn("slug", ["cast-acrylic", "polycarbonate"]).orderBy("name")
  ).map(rowToMaterial);
  const machineClasses = (await knex("machine_classes").where({ vendor_id: vendorId }).orderBy("rpm_max")).map(rowToMachineClass);
  const catalogue = { cutters, materials, machineClasses };
  const [family] = await knex("families")
    .insert({
      vendor_id: vendorId,
      slug: "o-flute-finishers",
      name: "O-flute finishers in clear plastics",
      cutter_selection: JSON.stringify({ series: "QC-P1-", geometries: [], skus: [] }),
      material_ids: materials.map((m) => m.id),
      machine_class_ids: machineClasses.map((k) => k.id),
      created_by: author,
    })
    .returning("id");
  const familyRef = {
    vendorId,
    id: family.id as string,
    name: "O-flute finishers in clear plastics",
    materialIds: materials.map((m) => m.id),
    machineClassIds: machineClasses.map((k) => k.id),
  };
  const ruleSets = await knex("family_rule_sets")
    .insert([
      {
        vendor_id: vendorId,
        family_id: family.id,
        number: 1,
        rules: JSON.stringify(familyRulesSchema.parse(RULES_V1)),
        note: "First rules: every number from the material's own data.",
        created_by: author,
      },
      {
        vendor_id: vendorId,
        family_id: family.id,
        number: 2,
        rules: JSON.stringify(familyRulesSchema.parse(RULES_V2)),
        note: "Deeper profiles on light routers; slots with a larger chip.",
        created_by: author,
      },
    ])
    .returning(["id", "number"]);
  const ruleSetId = (n: number) => ruleSets.find((r) => r.number === n)!.id as string;

  const [b1] = await knex("family_batches")
    .insert({ vendor_id: vendorId, family_id: family.id, number: 1, rule_set_id: ruleSetId(1), state: "generating", created_by: author })
    .returning(["id", "number"]);
  await generate(knex, b1, familyRef, RULES_V1, 1, catalogue, author);
  const written = knex("family_batch_items").where({ batch_id: b1.id }).whereIn("outcome", ["created", "new-version"]).select("version_id");
  await knex("sheet_versions").whereIn("id", written).update({ approved_by: reviewer, approved_at: knex.fn.now() });
  await knex("sheet_versions").whereIn("id", written).update({ state: "published", published_at: knex.fn.now() });
  await knex("family_batches")
    .where({ id: b1.id })
    .update({ state: "published", approved_by: reviewer, approved_at: knex.fn.now(), published_by: reviewer, published_at: knex.fn.now() });

  const [b2] = await knex("family_batches")
    .insert({ vendor_id: vendorId, family_id: family.id, number: 2, rule_set_id: ruleSetId(2), state: "generating", created_by: author })
    .returning(["id", "number"]);
  await generate(knex, b2, familyRef, RULES_V2, 2, catalogue, author);
  await knex("family_batches").where({ id: b2.id }).update({ state: "in_review" });
}
