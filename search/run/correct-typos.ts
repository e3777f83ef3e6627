import { parseQuery } from "@/search/parse/parse-query";
import type { ParsedQuery } from "@/search/parse/types";
import { searchSettings } from "@/search/settings";
import { vocabularyEntries } from "@/search/vocabulary/synonyms";

import { editDistance } from "./edit-distance";

const fold = (s: string) =>
  s
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase();

// Single-word vocabulary terms: the words a typo is most likely aimed at (`alumnium`, `acrilic`).
const DICTIONARY = [
  ...new Set(
    vocabularyEntries
      .flatMap((e) => [...e.terms, ...(e.looseTerms ?? [])])
      .map(fold)
      .filter((t) => /^[a-z]+$/.test(t)),
  ),
];
const KNOWN = new Set(DICTIONARY);

export type Correction = { from: string; to: string };

/** The closest vocabulary word within the typo budget of searchSettings, or undefined. */
export function correctWord(word: string): string | undefined {
  const w = fold(word);
  const { minWordSizeForOneTypo, minWordSizeForTwoTypos } = searchSettings.typoTolerance;
  if (w.length < minWordSizeForOneTypo || KNOWN.has(w) || !/^[a-z]+$/.test(w)) return undefined;
  const budget = w.length >= minWordSizeForTwoTypos ? 2 : 1;
  let best: { term: string; d: number } | undefined;
  for (const term of DICTIONARY) {
    const d = editDistance(w, term, budget);
    if (d <= budget && (!best || d < best.d)) best = { term, d };
  }
  return best?.term;
}

/**
 * Free-text words one or two typos from a vocabulary word are read as that word, and the query
 * is parsed again, so `alumnium` becomes the aluminium filter.
 */
export function correctTypos(parsed: ParsedQuery): { parsed: ParsedQuery; corrections: Correction[] } {
  const corrections: Correction[] = [];
  for (const word of parsed.text.split(" ").filter(Boolean)) {
    const to = correctWord(word);
    if (to && !corrections.some((c) => c.from === word)) corrections.push({ from: word, to });
  }
  if (corrections.length === 0) return { parsed, corrections };
  let query = parsed.query;
  for (const { from, to } of corrections) {
    query = query.replace(new RegExp(`(?<![\\p{L}\\p{N}])${from.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}(?![\\p{L}\\p{N}])`, "giu"), to);
  }
  return { parsed: parseQuery(query), corrections };
}
