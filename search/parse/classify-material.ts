import { materialByKey } from "@/search/vocabulary/lookup";
import type { MaterialGroup } from "@/search/vocabulary/types";

import { parseSpans } from "./parse-spans";

/**
 * The canonical material of a catalogue material, from its name and synonyms
 * (`Cast acrylic sheet` → `acrylic-cast`), for the index document. The first name that
 * mentions a known material wins; undefined when none does.
 */
export function classifyMaterial(names: readonly string[]): { key: string; group: MaterialGroup } | undefined {
  for (const name of names) {
    const hit = parseSpans(name).spans.find((s) => s.chip.kind === "material");
    const entry = hit && materialByKey(hit.chip.value);
    if (entry) return { key: entry.key, group: entry.group };
  }
  return undefined;
}
