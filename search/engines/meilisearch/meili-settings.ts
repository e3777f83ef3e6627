import type { Settings } from "meilisearch";

import { searchSettings } from "@/search/settings";

/** Multi-way groups become one entry per word; one-way synonyms are added to their key. */
export function meiliSynonyms(): Record<string, string[]> {
  const out: Record<string, Set<string>> = {};
  for (const group of searchSettings.synonyms) {
    for (const word of group) for (const other of group) if (other !== word) (out[word] ??= new Set()).add(other);
  }
  for (const [word, others] of Object.entries(searchSettings.oneWaySynonyms)) for (const o of others) (out[word] ??= new Set()).add(o);
  return Object.fromEntries(Object.entries(out).map(([k, v]) => [k, [...v]]));
}

// Engine-only attributes: the id and kind for scoped deletes and cutter look-ups, geometry for its filter.
const EXTRA_FILTERABLE = ["id", "kind", "geometry"];

/** searchSettings in Meilisearch's own form. */
export function meiliSettings(): Settings {
  const t = searchSettings.typoTolerance;
  return {
    searchableAttributes: [...searchSettings.searchableAttributes],
    filterableAttributes: [...searchSettings.filterableAttributes, ...EXTRA_FILTERABLE],
    sortableAttributes: [...searchSettings.sortableAttributes],
    synonyms: meiliSynonyms(),
    typoTolerance: {
      enabled: true,
      minWordSizeForTypos: { oneTypo: t.minWordSizeForOneTypo, twoTypos: t.minWordSizeForTwoTypos },
      disableOnAttributes: [...t.disableOnAttributes],
      disableOnNumbers: t.disableOnNumbers,
    },
    faceting: { maxValuesPerFacet: 100 },
  };
}
