import type { MaterialEntry } from "./types";

const PREFIXES = ["", "aluminium ", "aluminum ", "alu ", "Al "];

/** `6061`, `6061-T6`, `aluminium 6061`, `aluminum 6061-T6`, … for one wrought alloy. */
function alloy(designation: string, tempers: readonly string[], extra: readonly string[] = []): MaterialEntry {
  const bases = [designation, ...tempers.map((t) => `${designation}-${t}`)];
  return {
    key: `aluminium-${designation}`,
    label: `aluminium ${designation}`,
    group: "non-ferrous",
    parent: "aluminium",
    terms: [...PREFIXES.flatMap((p) => bases.map((b) => `${p}${b}`)), ...extra],
  };
}

export const aluminiumAlloys: readonly MaterialEntry[] = [
  alloy("6061", ["T6", "T651"], ["AlMg1SiCu"]),
  alloy("6082", ["T6", "T651"], ["AlSi1MgMn"]),
  alloy("5083", ["H111", "O"], ["AlMg4.5Mn"]),
];
