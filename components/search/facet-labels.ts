import { operationKindLabels } from "@/content-schema/sheet-kinds";
import type { FacetName } from "@/search/engines/engine-types";
import { materialByKey } from "@/search/vocabulary/lookup";

export const FACET_TITLES: Partial<Record<FacetName, string>> = {
  materialKey: "Material",
  operations: "Operation",
  diameterMm: "Cutter diameter",
  flutes: "Flutes",
  machineClass: "Machine class",
};

/** The URL parameter a facet value sets when chosen; facets without one are shown but not clickable. */
export const FACET_PARAM: Partial<Record<FacetName, "material" | "operation" | "diameterMm" | "flutes">> = {
  materialKey: "material",
  operations: "operation",
  diameterMm: "diameterMm",
  flutes: "flutes",
};

/** `names` maps machine class slugs to names where the hits carry them. */
export function facetValueLabel(facet: FacetName, value: string, names: ReadonlyMap<string, string> = new Map()): string {
  if (facet === "materialKey") return materialByKey(value)?.label ?? value;
  if (facet === "operations") return operationKindLabels[value as keyof typeof operationKindLabels] ?? value;
  if (facet === "diameterMm") return `Ø ${Number(value).toLocaleString("en", { maximumFractionDigits: 3 })} mm`;
  if (facet === "flutes") return `${value} ${value === "1" ? "flute" : "flutes"}`;
  return names.get(value) ?? value.replace(/-/g, " ");
}
