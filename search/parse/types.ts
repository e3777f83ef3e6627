import type { OperationKind } from "@/lib/machining/types";
import type { CornerForm, CutterGeometry, MaterialGroup } from "@/search/vocabulary/types";

export type ChipKind = "diameter" | "flutes" | "material" | "materialGroup" | "operation" | "cornerForm" | "geometry" | "sku";

/** A recognised part of the query, shown as a removable chip. */
export interface QueryChip {
  kind: ChipKind;
  /** Shown on the chip: "Ø 3.175 mm (1/8\")", "PMMA", "2 flutes", "slotting". */
  label: string;
  /** Canonical value: mm for a diameter, a count for flutes, a vocabulary key, an upper-case SKU. */
  value: string;
  /** The words of the query the chip came from (first occurrence). */
  sourceText: string;
}

export interface ParsedQuery {
  /** The sanitised, length-capped query the parser read; removeChip and looserQueries work on it. */
  query: string;
  /** Words left for free-text search: lower case, no accents, no punctuation, no stop words. */
  text: string;
  diameterMm?: number;
  /** The diameter in the unit the user wrote it in: `1/8"`, `0.13"`, `6 mm`. */
  diameterText?: string;
  flutes?: number;
  operations: OperationKind[];
  materials: string[];
  /** Groups named by a group word (`plastics`, `wood`); not the groups of `materials`. */
  materialGroups: MaterialGroup[];
  cornerForms: CornerForm[];
  geometry: CutterGeometry[];
  /** Catalogue-number-shaped tokens, upper case; they stay in `text` too, so use them to boost, not to filter. */
  skus: string[];
  chips: QueryChip[];
  /** True when the input was cut to MAX_QUERY_CHARS or MAX_QUERY_TOKENS. */
  truncated: boolean;
}
