import type { ChipKind, ParsedQuery } from "@/search/parse/types";
import { materialByKey, materialKeysWithin } from "@/search/vocabulary/lookup";

import type { QueryParts } from "../engines/engine-types";

/** The material filter at each width: as typed, then each wider material (extruded acrylic → acrylic), then the group. */
export function materialWidths(parsed: ParsedQuery): QueryParts[] {
  if (!parsed.materials.length) return [{}];
  const widths: QueryParts[] = [{ materialKeys: [...new Set(parsed.materials.flatMap(materialKeysWithin))] }];
  let keys = parsed.materials;
  for (let depth = 0; depth < 3; depth++) {
    const parents = [...new Set(keys.map((k) => materialByKey(k)?.parent ?? k))];
    if (parents.every((p, i) => p === keys[i]) && parents.length === keys.length) break;
    keys = parents;
    widths.push({ materialKeys: [...new Set(keys.flatMap(materialKeysWithin))] });
  }
  const groups = [...new Set(parsed.materials.map((k) => materialByKey(k)?.group).filter((g) => g !== undefined))];
  if (groups.length) widths.push({ materialGroups: groups });
  return widths;
}

/** Sets of kinds to drop: fewest first, and among equals the ones earliest in RELAX_ORDER. */
export function dropSets(present: readonly ChipKind[]): ChipKind[][] {
  const sets: ChipKind[][] = [];
  for (let mask = 0; mask < 1 << present.length; mask++) {
    const set = present.filter((_, i) => mask & (1 << i));
    // The material matters most: it goes only together with everything else.
    if (!set.includes("material") || set.length === present.length) sets.push(set);
  }
  const rank = (set: ChipKind[]) => set.map((k) => present.indexOf(k));
  return sets.sort((a, b) => {
    if (a.length !== b.length) return a.length - b.length;
    const ra = rank(a),
      rb = rank(b);
    for (let i = 0; i < ra.length; i++) if (ra[i] !== rb[i]) return ra[i] - rb[i];
    return 0;
  });
}
