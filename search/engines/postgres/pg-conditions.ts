import { searchSettings } from "@/search/settings";

import type { QueryParts } from "../engine-types";
import { frag, type Fragment } from "./sql-fragment";

const TOL = searchSettings.diameterToleranceMm;
const nonEmpty = <T>(v: readonly T[] | undefined): v is readonly T[] => Boolean(v && v.length);

/** One SQL condition per parsed part, each with the boost it earns when used for ranking. */
export function partConditions(parts: QueryParts): { cond: Fragment; weight: number }[] {
  const out: { cond: Fragment; weight: number }[] = [];
  if (nonEmpty(parts.materialKeys)) out.push({ cond: frag("d.material_key = any(?::text[])", [...parts.materialKeys]), weight: 3 });
  if (nonEmpty(parts.materialGroups)) out.push({ cond: frag("d.material_group = any(?::text[])", [...parts.materialGroups]), weight: 1.5 });
  if (nonEmpty(parts.operations)) out.push({ cond: frag("d.operations @> ?::text[]", [...parts.operations]), weight: 2 });
  if (parts.diameterMm !== undefined)
    out.push({ cond: frag("d.diameter_mm between ? and ?", parts.diameterMm - TOL, parts.diameterMm + TOL), weight: 3 });
  if (parts.flutes !== undefined) out.push({ cond: frag("d.flutes = ?", parts.flutes), weight: 1.5 });
  if (nonEmpty(parts.cornerForms)) out.push({ cond: frag("d.corner_form = any(?::text[])", [...parts.cornerForms]), weight: 1.5 });
  if (nonEmpty(parts.geometry)) out.push({ cond: frag("d.geometry = any(?::text[])", [...parts.geometry]), weight: 1 });
  if (parts.machineClass) out.push({ cond: frag("d.machine_class = ?", parts.machineClass), weight: 1 });
  if (nonEmpty(parts.skus))
    out.push({
      cond: frag(
        "upper(d.cutter_sku) = any(?::text[])",
        parts.skus.map((s) => s.toUpperCase()),
      ),
      weight: 8,
    });
  return out;
}
