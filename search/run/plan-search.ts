import type { OperationKind } from "@/lib/machining/types";
import type { ChipKind, ParsedQuery } from "@/search/parse/types";
import { materialKeysWithin } from "@/search/vocabulary/lookup";
import type { MaterialGroup } from "@/search/vocabulary/types";

import type { QueryParts } from "../engines/engine-types";
import { dropSets, materialWidths } from "./relax-steps";

/** Facet selections sent beside the query (`material=`, `operation=` …): hard filters, never relaxed. */
export type ExplicitFilters = {
  material?: string;
  materialGroup?: MaterialGroup;
  operation?: OperationKind;
  diameterMm?: number;
  flutes?: number;
};

// Loosened first when nothing matches all parts: flute counts are misremembered most, the material least.
const RELAX_ORDER: ChipKind[] = ["flutes", "geometry", "cornerForm", "operation", "diameter", "materialGroup", "material"];

function partsOf(parsed: ParsedQuery, kinds: ReadonlySet<ChipKind>): QueryParts {
  const has = (k: ChipKind) => kinds.has(k);
  return {
    ...(has("material") && parsed.materials.length && { materialKeys: [...new Set(parsed.materials.flatMap(materialKeysWithin))] }),
    ...(has("materialGroup") && parsed.materialGroups.length && { materialGroups: parsed.materialGroups }),
    ...(has("operation") && parsed.operations.length && { operations: parsed.operations }),
    ...(has("diameter") && parsed.diameterMm !== undefined && { diameterMm: parsed.diameterMm }),
    ...(has("flutes") && parsed.flutes !== undefined && { flutes: parsed.flutes }),
    ...(has("cornerForm") && parsed.cornerForms.length && { cornerForms: parsed.cornerForms }),
    ...(has("geometry") && parsed.geometry.length && { geometry: parsed.geometry }),
  };
}

function explicitParts(e: ExplicitFilters): QueryParts {
  return {
    ...(e.material && { materialKeys: materialKeysWithin(e.material).length ? materialKeysWithin(e.material) : [e.material] }),
    ...(e.materialGroup && { materialGroups: [e.materialGroup] }),
    ...(e.operation && { operations: [e.operation] }),
    ...(e.diameterMm !== undefined && { diameterMm: e.diameterMm }),
    ...(e.flutes !== undefined && { flutes: e.flutes }),
  };
}

const merge = (a: QueryParts, b: QueryParts): QueryParts => ({
  ...a,
  ...b,
  ...(a.operations && b.operations && { operations: [...new Set([...a.operations, ...b.operations])] }),
});

export type SearchPlan = { boosts: QueryParts; steps: { filters: QueryParts; dropped: ChipKind[] }[] };

// Enough steps to loosen a long query; each costs a round trip only while nothing matches.
const MAX_STEPS = 12;

/**
 * Every parsed part boosts the ranking. As filters: all parts first, then with fewer parts
 * (one kind dropped, then two …, flutes before diameters before materials) while nothing matches;
 * a material is widened before it is dropped. A step with no filter at all only when words remain.
 */
export function planSearch(parsed: ParsedQuery, explicit: ExplicitFilters = {}): SearchPlan {
  const present = RELAX_ORDER.filter((k) => parsed.chips.some((c) => c.kind === k));
  const fixed = explicitParts(explicit);
  const boosts = merge({ ...partsOf(parsed, new Set(present)), skus: parsed.skus }, fixed);
  const steps: SearchPlan["steps"] = [];
  const widths = materialWidths(parsed);
  for (const dropped of dropSets(present)) {
    const kept = new Set(present.filter((k) => !dropped.includes(k)));
    const keepsMaterial = kept.delete("material");
    for (const [w, width] of (keepsMaterial ? widths : [{}]).entries()) {
      const filters = merge({ ...partsOf(parsed, kept), ...width }, fixed);
      if (Object.keys(filters).length === 0 && dropped.length > 0 && parsed.text.trim() === "") continue;
      steps.push({ filters, dropped: w > 0 ? [...dropped, "material"] : dropped });
    }
  }
  return { boosts, steps: steps.slice(0, MAX_STEPS) };
}
