import type { MaterialGroup, VocabularyEntry } from "./types";

/** Words naming a whole group rather than one material. */
export const materialGroups: readonly VocabularyEntry<MaterialGroup>[] = [
  { key: "plastics", label: "plastics", terms: ["plastics", "plastic", "polymer", "polymers", "thermoplastic", "thermoplastics"] },
  {
    key: "wood",
    label: "wood and wood composites",
    terms: ["wood", "woods", "timber", "wood composite", "wood composites", "sheet goods"],
  },
  { key: "non-ferrous", label: "non-ferrous metals", terms: ["non-ferrous", "non-ferrous metal", "non-ferrous metals"] },
  { key: "ferrous", label: "ferrous metals", terms: ["ferrous", "ferrous metal", "ferrous metals"] },
  { key: "composites", label: "composites", terms: ["composites", "composite"] },
];
