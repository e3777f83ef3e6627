import { materials } from "./materials";
import type { MaterialEntry } from "./types";

const byKey = new Map(materials.map((m) => [m.key, m]));

export const materialByKey = (key: string): MaterialEntry | undefined => byKey.get(key);

/** The key itself and every narrower key under it (`aluminium` → `aluminium`, `aluminium-6061`, …), for filters. */
export function materialKeysWithin(key: string): string[] {
  const out = [key];
  for (let i = 0; i < out.length; i++) {
    for (const m of materials) if (m.parent === out[i] && !out.includes(m.key)) out.push(m.key);
  }
  return byKey.has(key) ? out : [];
}
