import { z } from "zod";

import { OPERATION_KINDS } from "@/lib/machining/types";
import { CORNER_FORMS, MATERIAL_GROUPS } from "@/search/vocabulary/types";

/**
 * One entry of the search index, engine-independent: a current published sheet version
 * (kind "sheet") or a catalogue cutter found by its SKU (kind "cutter").
 */
export const searchDocumentSchema = z.object({
  /** `sheet-<sheetId>` or `cutter-<cutterId>`: stable across versions, so publishing replaces the entry. */
  id: z.string().regex(/^(sheet|cutter)-[0-9a-f-]{36}$/),
  kind: z.enum(["sheet", "cutter"]),
  vendorId: z.uuid(),
  sheetId: z.uuid().nullable(),
  versionId: z.uuid().nullable(),
  cutterId: z.uuid(),
  /** Sheet slug, or the cutter SKU for a cutter. */
  slug: z.string(),
  versionNumber: z.number().int().nullable(),
  title: z.string(),
  summary: z.string(),
  cutterSku: z.string(),
  cutterName: z.string(),
  materialName: z.string().nullable(),
  /** The catalogue name, its synonyms and the vocabulary's words for the material. */
  materialNames: z.array(z.string()),
  materialKey: z.string().nullable(),
  materialGroup: z.enum(MATERIAL_GROUPS).nullable(),
  operations: z.array(z.enum(OPERATION_KINDS)),
  machineClass: z.string().nullable(),
  machineClassName: z.string().nullable(),
  diameterMm: z.number().positive(),
  flutes: z.number().int().positive(),
  cornerForm: z.enum(CORNER_FORMS),
  geometry: z.string(),
  tags: z.array(z.string()),
  body: z.string(),
  /** ISO timestamp; null for cutters. */
  publishedAt: z.string().nullable(),
});

export type SearchDocument = z.infer<typeof searchDocumentSchema>;

export const sheetDocId = (sheetId: string) => `sheet-${sheetId}`;
export const cutterDocId = (cutterId: string) => `cutter-${cutterId}`;
