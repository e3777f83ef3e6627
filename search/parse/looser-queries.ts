import { materialByKey } from "@/search/vocabulary/lookup";

import { parseSpans } from "./parse-spans";
import { spliceSpans } from "./remove-chip";
import { isStopWord } from "./stop-words";
import type { ChipKind, ParsedQuery } from "./types";

// Most specific first: what to give up before the material, which matters most.
const DROP_ORDER: ChipKind[] = ["sku", "diameter", "flutes", "geometry", "cornerForm", "operation", "materialGroup"];
const MAX_SUGGESTIONS = 5;

/**
 * Looser versions of the query for an empty result: drop one recognised part at a time,
 * widen a material to its group (`cast acrylic` → `plastics`), or keep only the recognised parts.
 */
export function looserQueries(parsed: ParsedQuery): string[] {
  const { query, spans, textTokens } = parseSpans(parsed.query);
  const out: string[] = [];
  for (const kind of DROP_ORDER) {
    for (const chip of parsed.chips.filter((c) => c.kind === kind)) {
      out.push(
        spliceSpans(
          query,
          spans.filter((s) => s.chip.kind === kind && s.chip.value === chip.value),
        ),
      );
    }
  }
  for (const chip of parsed.chips.filter((c) => c.kind === "material")) {
    const group = materialByKey(chip.value)?.group;
    const own = spans.filter((s) => s.chip.kind === "material" && s.chip.value === chip.value);
    if (group && !parsed.materialGroups.includes(group)) out.push(spliceSpans(query, own, group));
  }
  const words = textTokens.filter((t) => !spans.some((s) => s.start === t.start));
  if (spans.length > 0 && words.some((t) => !isStopWord(t.lower))) out.push(spliceSpans(query, words));
  return [...new Set(out)].filter((q) => q !== "" && q !== parsed.query).slice(0, MAX_SUGGESTIONS);
}

/** A short reading of the query for an empty state: `Ø 3.175 mm (1/8"), acrylic, slotting, “jig”`. */
export function describeQuery(parsed: ParsedQuery): string {
  const parts = parsed.chips.map((c) => c.label);
  const skus = new Set(parsed.skus.map((sku) => sku.toLowerCase()));
  const text = parsed.text
    .split(" ")
    .filter((word) => word && !skus.has(word))
    .join(" ");
  if (text) parts.push(`“${text}”`);
  return parts.join(", ");
}
