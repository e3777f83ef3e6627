/** One recognised thing and every word a user may type for it. */
export interface VocabularyEntry<K extends string = string> {
  key: K;
  /** Reader-facing name of the canonical thing. */
  label: string;
  /** Spellings as they should be shown on a chip; matched case-, accent-, space- and hyphen-insensitively. */
  terms: readonly string[];
  /**
   * Words the parser also maps to this key that are not true synonyms (a species of the
   * material, an ambiguous short form): engines get them as one-way synonyms only.
   */
  looseTerms?: readonly string[];
}

export const MATERIAL_GROUPS = ["plastics", "wood", "non-ferrous", "ferrous", "composites"] as const;
export type MaterialGroup = (typeof MATERIAL_GROUPS)[number];

export interface MaterialEntry extends VocabularyEntry {
  group: MaterialGroup;
  /** A wider material this one belongs to (an alloy of aluminium, a form of acrylic). */
  parent?: string;
}

/** Same values as the cutters.corner_form check constraint. */
export const CORNER_FORMS = ["square", "ball", "corner-radius"] as const;
export type CornerForm = (typeof CORNER_FORMS)[number];

/** Same values as the cutters.geometry check constraint, less the default "straight". */
export const CUTTER_GEOMETRIES = ["single-flute", "o-flute", "upcut", "downcut", "compression"] as const;
export type CutterGeometry = (typeof CUTTER_GEOMETRIES)[number];

export interface GeometryEntry extends VocabularyEntry<CutterGeometry> {
  /** Flute count the word implies ("o-flute" is a one-flute cutter). */
  flutes?: number;
}
