// Invented demo data: catalogues and recipe sheets for the two fictional vendors.
import type { Knex } from "knex";

import { cutterFieldsSchema } from "@/content-schema/catalogue-cutter";
import { machineClassFieldsSchema } from "@/content-schema/catalogue-machine-class";
import { materialFieldsSchema } from "@/content-schema/catalogue-material";
import { cutterToRow, machineClassToRow, materialToRow } from "@/lib/catalogue/catalogue-rows";
import { formatIssue } from "@/lib/mdx/sheet-issue";
import { validateSheetSource } from "@/lib/mdx/validate-sheet-source";

import type { SeededIds } from "./seed-foundation";
import { DEMO_CUTTERS, DEMO_MACHINE_CLASSES, DEMO_MATERIALS } from "./sheets/demo-catalogue";
import { DEMO_SHEET_PLAN, demoSheetSlug, publishedCount, seededVersions } from "./sheets/demo-sheet-plan";
import { demoSheetSource } from "./sheets/demo-sheet-source";

const DAY = 86_400_000;
const START = Date.UTC(2026, 2, 2);

async function seedCatalogue(knex: Knex, vendorSlug: string, vendorId: string) {
  const ids = { cutters: new Map<string, string>(), materials: new Map<string, string>(), classes: new Map<string, string>() };
  for (const c of DEMO_CUTTERS[vendorSlug]) {
    const row = {
      ...cutterToRow(cutterFieldsSchema.parse(c)),
      vendor_id: vendorId,
      short_code: c.sku.toLowerCase().replace(/[^a-z0-9]/g, ""),
    };
    ids.cutters.set(c.sku, (await knex("cutters").insert(row).returning("id"))[0].id);
  }
  for (const m of DEMO_MATERIALS[vendorSlug]) {
    const row = { ...materialToRow(materialFieldsSchema.parse(m)), vendor_id: vendorId };
    ids.materials.set(m.slug, (await knex("materials").insert(row).returning("id"))[0].id);
  }
  for (const k of DEMO_MACHINE_CLASSES[vendorSlug]) {
    const row = { ...machineClassToRow(machineClassFieldsSchema.parse(k)), vendor_id: vendorId };
    ids.classes.set(k.slug, (await knex("machine_classes").insert(row).returning("id"))[0].id);
  }
  return ids;
}

function checkedSource(source: string, where: string) {
  const result = validateSheetSource(source);
  if (!result.ok) throw new Error(`Demo sheet ${where} does not validate: ${result.issues.map(formatIssue).join("; ")}`);
  return result.frontMatter;
}

export async function seedSheets(knex: Knex, { vendors, users }: SeededIds): Promise<{ sheets: number; versions: number }> {
  let sheets = 0;
  let versions = 0;
  for (const [vendorSlug, planned] of Object.entries(DEMO_SHEET_PLAN)) {
    const vendorId = vendors[vendorSlug];
    const author = users[`eng1@${vendorSlug}.test`];
    const reviewer = users[`eng2@${vendorSlug}.test`];
    const ids = await seedCatalogue(knex, vendorSlug, vendorId);
    for (const [index, sheet] of planned.entries()) {
      const cutter = DEMO_CUTTERS[vendorSlug].find((c) => c.sku === sheet.cutter)!;
      const material = DEMO_MATERIALS[vendorSlug].find((m) => m.slug === sheet.material)!;
      const machineClass = DEMO_MACHINE_CLASSES[vendorSlug].find((k) => k.slug === sheet.machineClass)!;
      const slug = demoSheetSlug(sheet);
      const [{ id: sheetId }] = await knex("sheets")
        .insert({
          vendor_id: vendorId,
          slug,
          cutter_id: ids.cutters.get(cutter.sku),
          material_id: ids.materials.get(material.slug),
          machine_class_id: ids.classes.get(machineClass.slug),
          created_by: author,
        })
        .returning("id");
      sheets++;
      const all = seededVersions(sheet);
      const P = publishedCount(sheet);
      for (const [i, version] of all.entries()) {
        const number = i + 1;
        const source = demoSheetSource({ cutter, material, machineClass, sheet, version });
        const frontMatter = checkedSource(source, `${vendorSlug}/${slug} v${number}`);
        const at = new Date(START + (index * 3 + i * 40) * DAY);
        const state = i < P - 1 ? "superseded" : i === P - 1 ? (sheet.withdrawnReason ? "withdrawn" : "published") : sheet.openDraft!;
        const published = i < P;
        await knex("sheet_versions").insert({
          vendor_id: vendorId,
          sheet_id: sheetId,
          number,
          state,
          title: frontMatter.title,
          source,
          front_matter: JSON.stringify(frontMatter),
          change_note: state === "draft" ? "" : version.changeNote,
          author_id: author,
          updated_by: author,
          created_at: at,
          updated_at: at,
          submitted_at: state === "draft" ? null : at,
          approved_by: published ? reviewer : null,
          approved_at: published ? at : null,
          published_at: published ? at : null,
          superseded_at: state === "superseded" ? new Date(at.getTime() + 40 * DAY) : null,
          withdrawn_at: state === "withdrawn" ? new Date(at.getTime() + 20 * DAY) : null,
          withdrawn_reason: state === "withdrawn" ? sheet.withdrawnReason : null,
        });
        versions++;
      }
    }
  }
  return { sheets, versions };
}
