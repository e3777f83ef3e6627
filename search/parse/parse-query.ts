import type { OperationKind } from "@/lib/machining/types";
import type { CornerForm, CutterGeometry, MaterialGroup } from "@/search/vocabulary/types";

import { parseSpans } from "./parse-spans";
import { isStopWord } from "./stop-words";
import type { ParsedQuery, QueryChip } from "./types";

const unique = <T>(values: T[]) => [...new Set(values)];

/**
 * Reads a search box query into filters (diameter, flutes, materials, operations, corner forms,
 * geometry), SKUs and the free text left over. Never throws: any string, however odd, is answered.
 */
export function parseQuery(input: string): ParsedQuery {
  const { query, truncated, spans, textTokens } = parseSpans(input);
  const values = (kind: QueryChip["kind"]) => unique(spans.filter((s) => s.chip.kind === kind).map((s) => s.chip.value));
  const chips: QueryChip[] = [];
  for (const { chip } of spans) {
    if (!chips.some((c) => c.kind === chip.kind && c.value === chip.value)) chips.push(chip);
  }
  const diameter = spans.find((s) => s.chip.kind === "diameter");
  const flutes = spans.find((s) => s.flutes !== undefined)?.flutes;
  const text = textTokens
    .map((t) => t.lower.replace(/"$/, ""))
    .filter((word) => !isStopWord(word))
    .join(" ");
  return {
    query,
    text,
    ...(diameter && { diameterMm: Number(diameter.chip.value), diameterText: diameter.diameterText }),
    ...(flutes !== undefined && { flutes }),
    operations: values("operation") as OperationKind[],
    materials: values("material"),
    materialGroups: values("materialGroup") as MaterialGroup[],
    cornerForms: values("cornerForm") as CornerForm[],
    geometry: values("geometry") as CutterGeometry[],
    skus: values("sku"),
    chips,
    truncated,
  };
}
