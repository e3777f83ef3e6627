import "server-only";

import type { Knex } from "knex";

import { db } from "@/lib/db/knex";
import { joinSheetCatalogue } from "@/lib/sheets/join-sheet-catalogue";

import { buildCutterDocument, buildSheetDocument, type CutterRow } from "./build-sheet-document";
import type { SearchDocument } from "./document-schema";

type Row = Record<string, unknown>;
const toCutter = (r: Row, p = ""): CutterRow => ({
  id: r[`${p}id`] as string,
  sku: r[`${p}sku`] as string,
  name: r[`${p}name`] as string,
  diameterMm: Number(r[`${p}diameter_mm`]),
  flutes: Number(r[`${p}flutes`]),
  cornerForm: r[`${p}corner_form`] as string,
  geometry: r[`${p}geometry`] as string,
  notes: (r[`${p}notes`] as string | undefined) ?? "",
});

/** Index documents of the current published versions of a vendor's sheets (all, or the given sheets). */
export async function loadSheetDocuments({
  vendorId,
  sheetIds,
  knex = db,
}: {
  vendorId: string;
  sheetIds?: readonly string[];
  knex?: Knex;
}): Promise<SearchDocument[]> {
  const query = joinSheetCatalogue(knex("sheet_versions as v"))
    .where({ "v.vendor_id": vendorId, "v.state": "published" })
    .select(
      "s.id as sheet_id",
      "s.slug as sheet_slug",
      "v.id as version_id",
      "v.number",
      "v.title",
      "v.source",
      "v.front_matter",
      "v.published_at",
      "c.id as c_id",
      "c.sku as c_sku",
      "c.name as c_name",
      "c.diameter_mm as c_diameter_mm",
      "c.flutes as c_flutes",
      "c.corner_form as c_corner_form",
      "c.geometry as c_geometry",
      "m.slug as m_slug",
      "m.name as m_name",
      "m.material_group as m_group",
      "m.synonyms as m_synonyms",
      "k.slug as k_slug",
      "k.name as k_name",
    );
  if (sheetIds) query.whereIn("s.id", [...sheetIds]);
  const rows: Row[] = await query;
  return rows.map((r) =>
    buildSheetDocument({
      vendorId,
      sheet: { id: r.sheet_id as string, slug: r.sheet_slug as string },
      version: {
        id: r.version_id as string,
        number: r.number as number,
        title: r.title as string,
        source: r.source as string,
        frontMatter: r.front_matter,
        publishedAt: r.published_at as Date | null,
      },
      cutter: toCutter(r, "c_"),
      material: {
        slug: r.m_slug as string,
        name: r.m_name as string,
        group: r.m_group as string,
        synonyms: (r.m_synonyms as string[] | null) ?? [],
      },
      machineClass: { slug: r.k_slug as string, name: r.k_name as string },
    }),
  );
}

export async function loadCutterDocuments({
  vendorId,
  cutterIds,
  knex = db,
}: {
  vendorId: string;
  cutterIds?: readonly string[];
  knex?: Knex;
}): Promise<SearchDocument[]> {
  const query = knex("cutters")
    .where({ vendor_id: vendorId })
    .select("id", "sku", "name", "diameter_mm", "flutes", "corner_form", "geometry", "notes");
  if (cutterIds) query.whereIn("id", [...cutterIds]);
  const rows: Row[] = await query;
  return rows.map((r) => buildCutterDocument(vendorId, toCutter(r)));
}

const COLUMN = { cutter: "cutter_id", material: "material_id", machine_class: "machine_class_id" } as const;

/** Sheets of the vendor that use a catalogue entry, whose documents a catalogue edit changes. */
export async function sheetIdsUsing({
  vendorId,
  entity,
  entityId,
  knex = db,
}: {
  vendorId: string;
  entity: keyof typeof COLUMN;
  entityId: string;
  knex?: Knex;
}): Promise<string[]> {
  const rows: { id: string }[] = await knex("sheets")
    .where({ vendor_id: vendorId, [COLUMN[entity]]: entityId })
    .select("id");
  return rows.map((r) => r.id);
}
