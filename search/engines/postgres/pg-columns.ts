import type { SearchDocument } from "@/search/document/document-schema";
import { indexWords, operationWords } from "@/search/document/index-words";

/** Columns the hits carry back (the body stays in the index). */
export const DOC_COLUMNS = [
  "doc_id",
  "kind",
  "vendor_id",
  "sheet_id",
  "version_id",
  "cutter_id",
  "slug",
  "version_number",
  "title",
  "summary",
  "cutter_sku",
  "cutter_name",
  "material_name",
  "material_names",
  "material_key",
  "material_group",
  "operations",
  "machine_class",
  "machine_class_name",
  "diameter_mm",
  "flutes",
  "corner_form",
  "geometry",
  "tags",
  "published_at",
] as const;

type Row = Record<string, unknown>;
const text = (v: unknown) => (v === null || v === undefined ? null : String(v));

export function docToRow(doc: SearchDocument): Row {
  return {
    doc_id: doc.id,
    kind: doc.kind,
    vendor_id: doc.vendorId,
    sheet_id: doc.sheetId,
    version_id: doc.versionId,
    cutter_id: doc.cutterId,
    slug: doc.slug,
    version_number: doc.versionNumber,
    title: doc.title,
    summary: doc.summary,
    cutter_sku: doc.cutterSku,
    cutter_name: doc.cutterName,
    material_name: doc.materialName,
    material_names: doc.materialNames,
    material_key: doc.materialKey,
    material_group: doc.materialGroup,
    operations: doc.operations,
    machine_class: doc.machineClass,
    machine_class_name: doc.machineClassName,
    diameter_mm: doc.diameterMm,
    flutes: doc.flutes,
    corner_form: doc.cornerForm,
    geometry: doc.geometry,
    tags: doc.tags,
    body: doc.body,
    words: indexWords(doc),
    published_at: doc.publishedAt,
  };
}

/** The text of each tsvector weight, in the order of searchSettings.searchableAttributes (A most important). */
export function weightedText(doc: SearchDocument): [a: string, b: string, c: string, d: string] {
  return [
    `${doc.title} ${doc.cutterSku}`,
    `${doc.cutterName} ${doc.materialNames.join(" ")}`,
    `${operationWords(doc)} ${doc.tags.join(" ")} ${doc.machineClassName ?? ""}`,
    `${doc.summary} ${doc.body}`,
  ];
}

export function rowToDoc(r: Row): SearchDocument {
  return {
    id: r.doc_id as string,
    kind: r.kind as SearchDocument["kind"],
    vendorId: r.vendor_id as string,
    sheetId: text(r.sheet_id),
    versionId: text(r.version_id),
    cutterId: r.cutter_id as string,
    slug: r.slug as string,
    versionNumber: r.version_number === null ? null : Number(r.version_number),
    title: r.title as string,
    summary: (r.summary as string) ?? "",
    cutterSku: r.cutter_sku as string,
    cutterName: r.cutter_name as string,
    materialName: text(r.material_name),
    materialNames: (r.material_names as string[]) ?? [],
    materialKey: text(r.material_key),
    materialGroup: text(r.material_group) as SearchDocument["materialGroup"],
    operations: (r.operations as SearchDocument["operations"]) ?? [],
    machineClass: text(r.machine_class),
    machineClassName: text(r.machine_class_name),
    diameterMm: Number(r.diameter_mm),
    flutes: Number(r.flutes),
    cornerForm: r.corner_form as SearchDocument["cornerForm"],
    geometry: r.geometry as string,
    tags: (r.tags as string[]) ?? [],
    body: "",
    // The search statement writes it as ISO 8601 text already (see pg-search-sql).
    publishedAt: typeof r.published_at === "string" ? r.published_at : null,
  };
}
