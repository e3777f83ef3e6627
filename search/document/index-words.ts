import { operations } from "@/search/vocabulary/operations";

import type { SearchDocument } from "./document-schema";

const fold = (s: string) =>
  s
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase();

/**
 * The distinct words of a document's short fields (title, cutter, material names, operations
 * in trade words, tags), for trigram typo matching: `alumnium` is close to a word here.
 */
export function indexWords(doc: SearchDocument): string {
  const opWords = operations.filter((op) => doc.operations.includes(op.key)).flatMap((op) => [op.label, ...op.terms]);
  const text = [
    doc.title,
    doc.cutterName,
    doc.cutterSku,
    ...doc.materialNames,
    ...opWords,
    ...doc.tags,
    doc.machineClassName ?? "",
    doc.geometry,
  ].join(" ");
  const words = fold(text).match(/[\p{L}\p{N}]+(?:[-.][\p{L}\p{N}]+)*/gu) ?? [];
  return [...new Set(words.filter((w) => w.length >= 2))].join(" ");
}

/** Words of the operations for the tsvector: the trade words, so `contour` finds a profile sheet. */
export function operationWords(doc: SearchDocument): string {
  return operations
    .filter((op) => doc.operations.includes(op.key))
    .flatMap((op) => [op.label, ...op.terms])
    .join(" ");
}
