import type { CornerForm, VocabularyEntry } from "./types";

// "bullnose" follows the brief (ball); note that many shops say "bull nose" for a corner radius.
export const cornerForms: readonly VocabularyEntry<CornerForm>[] = [
  { key: "ball", label: "ball nose", terms: ["ball", "ball nose", "ball end"], looseTerms: ["bullnose"] },
  { key: "corner-radius", label: "corner radius", terms: ["bull", "corner radius", "radiused", "radius corner", "radiused corner"] },
  { key: "square", label: "square end", terms: ["square", "square end", "flat end", "flat bottom"], looseTerms: ["flat"] },
];
