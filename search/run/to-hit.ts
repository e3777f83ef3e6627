import type { SearchDocument } from "@/search/document/document-schema";
import type { ParsedQuery } from "@/search/parse/types";
import { materialByKey, materialKeysWithin } from "@/search/vocabulary/lookup";
import { operations } from "@/search/vocabulary/operations";

import type { Correction } from "./correct-typos";
import { highlighter, type HighlightRange } from "./highlight";
import type { SearchHit } from "./search-response";

/** Words to mark in a hit: what was typed, what it was corrected to, and the vocabulary's words for each part. */
export function highlightTerms(parsed: ParsedQuery, corrections: readonly Correction[]): string[] {
  const terms = [...parsed.text.split(" "), ...corrections.map((c) => c.to), ...parsed.chips.map((c) => c.sourceText)];
  for (const key of parsed.materials.flatMap(materialKeysWithin)) terms.push(...(materialByKey(key)?.terms ?? []));
  for (const op of operations.filter((o) => parsed.operations.includes(o.key))) terms.push(...op.terms);
  return terms.filter((t) => t && t.length >= 2);
}

/** Maps the engine's documents to hits; the highlight terms are worked out once for all of them. */
export function toHits(docs: readonly SearchDocument[], parsed: ParsedQuery, corrections: readonly Correction[]): SearchHit[] {
  const mark = highlighter(highlightTerms(parsed, corrections));
  return docs.map((doc) => toHit(doc, mark));
}

export function toHit(doc: SearchDocument, mark: (text: string) => HighlightRange[]): SearchHit {
  return {
    slug: doc.slug,
    version: doc.versionNumber ?? 0,
    title: doc.title,
    summary: doc.summary,
    cutter: { sku: doc.cutterSku, name: doc.cutterName, diameterMm: doc.diameterMm, flutes: doc.flutes, cornerForm: doc.cornerForm },
    material: { name: doc.materialName, key: doc.materialKey, group: doc.materialGroup },
    machineClass: doc.machineClass ? { slug: doc.machineClass, name: doc.machineClassName ?? doc.machineClass } : null,
    operations: doc.operations,
    publishedAt: doc.publishedAt,
    highlights: {
      title: mark(doc.title),
      summary: mark(doc.summary),
      cutter: mark(`${doc.cutterSku} ${doc.cutterName}`),
      material: mark(doc.materialName ?? ""),
    },
  };
}
