import { cornerForms } from "./corner-forms";
import { geometries } from "./geometry";
import { materialGroups } from "./material-groups";
import { materials } from "./materials";
import { operations } from "./operations";
import type { VocabularyEntry } from "./types";

/** Every vocabulary entry, in the order the parser reports them. */
export const vocabularyEntries: readonly VocabularyEntry[] = [
  ...materials,
  ...materialGroups,
  ...operations,
  ...cornerForms,
  ...geometries,
];

const lower = (terms: readonly string[]) => [...new Set(terms.map((term) => term.toLowerCase()))];

/** Multi-way synonym groups for the engines, one per entry; derived so the words live in one place. */
export const synonymGroups: readonly (readonly string[])[] = vocabularyEntries
  .map((entry) => lower(entry.terms))
  .filter((group) => group.length > 1);

/** One-way synonyms: a loose word (`oak`) also finds the entry's words (`hardwood`), not the reverse. */
export const oneWaySynonyms: Readonly<Record<string, readonly string[]>> = Object.fromEntries(
  vocabularyEntries.flatMap((entry) => lower(entry.looseTerms ?? []).map((loose) => [loose, lower(entry.terms)])),
);
