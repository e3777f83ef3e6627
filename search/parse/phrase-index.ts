import { cornerForms } from "@/search/vocabulary/corner-forms";
import { geometries } from "@/search/vocabulary/geometry";
import { materialGroups } from "@/search/vocabulary/material-groups";
import { materials } from "@/search/vocabulary/materials";
import { operations } from "@/search/vocabulary/operations";
import { termKey, termWordCount } from "@/search/vocabulary/term-key";
import type { VocabularyEntry } from "@/search/vocabulary/types";

import type { Token } from "./tokenise";
import type { ChipKind } from "./types";

export interface PhraseHit {
  kind: ChipKind;
  key: string;
  /** For a material the term as the vocabulary spells it (`PMMA`, `plexi`); else the entry's label (`slotting`). */
  label: string;
  flutes?: number;
}

const index = new Map<string, PhraseHit>();
let widest = 1;

function add(kind: ChipKind, entries: readonly (VocabularyEntry & { flutes?: number })[]) {
  for (const entry of entries) {
    for (const term of [...entry.terms, ...(entry.looseTerms ?? [])]) {
      const key = termKey(term);
      const label = kind === "material" ? term : entry.label;
      if (!index.has(key)) index.set(key, { kind, key: entry.key, label, flutes: entry.flutes });
      widest = Math.max(widest, termWordCount(term));
    }
  }
}

add("material", materials);
add("materialGroup", materialGroups);
add("operation", operations);
add("cornerForm", cornerForms);
add("geometry", geometries);

/** The longest vocabulary phrase starting at token `i`, so `cast acrylic` wins over `cast` + `acrylic`. */
export function matchPhrase(tokens: readonly Token[], i: number): { count: number; hit: PhraseHit } | null {
  for (let w = Math.min(widest, tokens.length - i); w >= 1; w--) {
    const hit = index.get(
      tokens
        .slice(i, i + w)
        .map((t) => termKey(t.text))
        .join(""),
    );
    if (hit) return { count: w, hit };
  }
  return null;
}
