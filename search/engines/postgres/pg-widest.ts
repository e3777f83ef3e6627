import { searchSettings } from "@/search/settings";

import type { QueryParts } from "../engine-types";
import { frag, type Fragment } from "./sql-fragment";

const TOL = searchSettings.diameterToleranceMm;
const has = <T>(v: readonly T[] | undefined): v is readonly T[] => Boolean(v && v.length);
const union = <T>(lists: readonly (readonly T[] | undefined)[]) => [...new Set(lists.flatMap((l) => l ?? []))];

/**
 * Conditions (AND-ed) that every document matching any of `steps` meets: a part kind present in every
 * step, at its widest (materials by key or group, operations every step asks for, the diameter range
 * of all steps). An index-friendly outer bound for the relaxed steps of a search; empty when there is none.
 */
export function widestConditions(steps: readonly QueryParts[]): Fragment[] {
  if (steps.length === 0) return [];
  const every = (test: (s: QueryParts) => boolean) => steps.every(test);
  const out: Fragment[] = [];
  if (every((s) => has(s.materialKeys) || has(s.materialGroups))) {
    const keys = union(steps.map((s) => s.materialKeys));
    const groups = union(steps.map((s) => s.materialGroups));
    if (keys.length && groups.length)
      out.push(frag("(d.material_key = any(?::text[]) or d.material_group = any(?::text[]))", keys, groups));
    else if (keys.length) out.push(frag("d.material_key = any(?::text[])", keys));
    else out.push(frag("d.material_group = any(?::text[])", groups));
  }
  if (every((s) => has(s.operations))) {
    const common = steps
      .slice(1)
      .reduce<readonly string[]>((acc, s) => acc.filter((op) => s.operations!.includes(op as never)), steps[0].operations!);
    if (common.length) out.push(frag("d.operations @> ?::text[]", [...common]));
  }
  if (every((s) => s.diameterMm !== undefined)) {
    const sizes = steps.map((s) => s.diameterMm!);
    out.push(frag("d.diameter_mm between ? and ?", Math.min(...sizes) - TOL, Math.max(...sizes) + TOL));
  }
  if (every((s) => s.flutes !== undefined)) out.push(frag("d.flutes = any(?::int[])", [...new Set(steps.map((s) => s.flutes!))]));
  if (every((s) => has(s.cornerForms))) out.push(frag("d.corner_form = any(?::text[])", union(steps.map((s) => s.cornerForms))));
  if (every((s) => has(s.geometry))) out.push(frag("d.geometry = any(?::text[])", union(steps.map((s) => s.geometry))));
  if (every((s) => s.machineClass !== undefined))
    out.push(frag("d.machine_class = any(?::text[])", [...new Set(steps.map((s) => s.machineClass!))]));
  if (every((s) => has(s.skus)))
    out.push(
      frag(
        "upper(d.cutter_sku) = any(?::text[])",
        union(steps.map((s) => s.skus)).map((s) => s.toUpperCase()),
      ),
    );
  return out;
}
