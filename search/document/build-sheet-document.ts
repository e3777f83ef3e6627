import { normalizeOperationKind, OPERATION_KINDS, type OperationKind } from "@/lib/machining/types";
import { classifyMaterial } from "@/search/parse/classify-material";
import { materialByKey } from "@/search/vocabulary/lookup";
import { CORNER_FORMS, MATERIAL_GROUPS, type CornerForm, type MaterialGroup } from "@/search/vocabulary/types";

import { cutterDocId, sheetDocId, type SearchDocument } from "./document-schema";
import { mdxToPlainText } from "./plain-text";

export type CutterRow = {
  id: string;
  sku: string;
  name: string;
  diameterMm: number;
  flutes: number;
  cornerForm: string;
  geometry: string;
  notes?: string;
};
export type MaterialRow = { slug: string; name: string; group: string; synonyms: readonly string[] };
export type SheetDocumentSource = {
  vendorId: string;
  sheet: { id: string; slug: string };
  version: { id: string; number: number; title: string; source: string; frontMatter: unknown; publishedAt: Date | string | null };
  cutter: CutterRow;
  material: MaterialRow;
  machineClass: { slug: string; name: string };
};

const unique = (values: readonly string[]) => [...new Set(values.map((v) => v.trim()).filter(Boolean))];
const isKind = (v: unknown): v is OperationKind => (OPERATION_KINDS as readonly unknown[]).includes(v);
const kindOf = (v: unknown) => (typeof v === "string" ? normalizeOperationKind(v) : v);
const asCorner = (v: string): CornerForm => ((CORNER_FORMS as readonly string[]).includes(v) ? (v as CornerForm) : "square");
const asGroup = (v: string): MaterialGroup | null => ((MATERIAL_GROUPS as readonly string[]).includes(v) ? (v as MaterialGroup) : null);
const iso = (v: Date | string | null) => (v === null ? null : new Date(v).toISOString());

/** Vocabulary words of a material key and of the wider materials above it (cast acrylic → acrylic, PMMA …). */
function vocabularyWords(key: string | undefined): string[] {
  const out: string[] = [];
  for (let entry = key ? materialByKey(key) : undefined; entry; entry = entry.parent ? materialByKey(entry.parent) : undefined) {
    out.push(entry.label, ...entry.terms);
  }
  return out;
}

function frontMatterParts(frontMatter: unknown) {
  const fm = (typeof frontMatter === "object" && frontMatter !== null ? frontMatter : {}) as Record<string, unknown>;
  const ops = Array.isArray(fm.operations) ? fm.operations : [];
  return {
    summary: typeof fm.summary === "string" ? fm.summary : "",
    // Stored versions may carry a key from before a rename ("adaptive"): read it as the current one.
    operations: [...new Set(ops.map((op) => kindOf((op as { kind?: unknown })?.kind)).filter(isKind))],
    tags: Array.isArray(fm.tags) ? fm.tags.filter((t): t is string => typeof t === "string") : [],
  };
}

export function materialNamesOf(material: MaterialRow): { names: string[]; key: string | null } {
  const hit = classifyMaterial([material.name, ...material.synonyms, material.slug.replace(/-/g, " ")]);
  return { names: unique([material.name, ...material.synonyms, ...vocabularyWords(hit?.key)]), key: hit?.key ?? null };
}

/** The index document of a sheet's current published version; pure, from the loaded rows. */
export function buildSheetDocument(src: SheetDocumentSource): SearchDocument {
  const { summary, operations, tags } = frontMatterParts(src.version.frontMatter);
  const material = materialNamesOf(src.material);
  return {
    id: sheetDocId(src.sheet.id),
    kind: "sheet",
    vendorId: src.vendorId,
    sheetId: src.sheet.id,
    versionId: src.version.id,
    cutterId: src.cutter.id,
    slug: src.sheet.slug,
    versionNumber: src.version.number,
    title: src.version.title,
    summary,
    cutterSku: src.cutter.sku,
    cutterName: src.cutter.name,
    materialName: src.material.name,
    materialNames: material.names,
    materialKey: material.key,
    materialGroup: asGroup(src.material.group),
    operations,
    machineClass: src.machineClass.slug,
    machineClassName: src.machineClass.name,
    diameterMm: src.cutter.diameterMm,
    flutes: src.cutter.flutes,
    cornerForm: asCorner(src.cutter.cornerForm),
    geometry: src.cutter.geometry,
    tags: unique(tags),
    body: mdxToPlainText(src.version.source),
    publishedAt: iso(src.version.publishedAt),
  };
}

/** A cutter of the catalogue, found by SKU or name. */
export function buildCutterDocument(vendorId: string, cutter: CutterRow): SearchDocument {
  return {
    id: cutterDocId(cutter.id),
    kind: "cutter",
    vendorId,
    sheetId: null,
    versionId: null,
    cutterId: cutter.id,
    slug: cutter.sku,
    versionNumber: null,
    title: cutter.name,
    summary: cutter.notes ?? "",
    cutterSku: cutter.sku,
    cutterName: cutter.name,
    materialName: null,
    materialNames: [],
    materialKey: null,
    materialGroup: null,
    operations: [],
    machineClass: null,
    machineClassName: null,
    diameterMm: cutter.diameterMm,
    flutes: cutter.flutes,
    cornerForm: asCorner(cutter.cornerForm),
    geometry: cutter.geometry,
    tags: [],
    body: "",
    publishedAt: null,
  };
}
