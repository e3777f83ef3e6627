// Invented demo data: which cutter × material × machine class each fictional vendor publishes,
// and the later versions with their change notes.
import type { OperationKind } from "@/content-schema/sheet-kinds";

/** `first-edition`: numbers as first published (seeds/sheets/first-edition-numbers.ts); `current`: derived by today's rules. */
export type Derivation = "first-edition" | "current";
export type PlannedVersion = { chipLoadScale: number; depthScale: number; changeNote: string; derivation?: Derivation };
export type PlannedSheet = {
  cutter: string;
  material: string;
  machineClass: string;
  kinds: OperationKind[];
  versions: PlannedVersion[];
  withdrawnReason?: string;
  openDraft?: "draft" | "in_review";
};

const FIRST: PlannedVersion = { chipLoadScale: 1, depthScale: 1, changeNote: "First version, from test cuts on the reference machine." };
const FEED_DOWN: PlannedVersion = {
  chipLoadScale: 0.9,
  depthScale: 1,
  changeNote: "Feed lowered 10 % after field reports of chatter on this machine class.",
};
// The plastics sheet of the Field-results melting story (seeds/seed-field.ts): v1 rubbed and welded, v2 cuts.
const CHIP_UP: PlannedVersion = {
  chipLoadScale: 1.25,
  depthScale: 1,
  changeNote: "Chip load raised 25 %: at the old feed the cutter rubbed and the chips welded in the slot.",
};
const DEPTH_DOWN: PlannedVersion = {
  chipLoadScale: 0.9,
  depthScale: 0.8,
  changeNote: "Axial depth reduced 20 %: customers reported deflection at long stick-out.",
};

// Every sheet published before the cutting-data model was revised gets a revised version with the same
// scales: its plunge came from a third of the feed, its slot ran at the pocketing chip, its light passes
// rubbed under the material's floor. The customers who saved setups from it get the change alert.
export const REVISION_NOTE =
  "Numbers re-derived with the revised cutting-data rules: plunge feed from the Z thrust of the reference machine instead of a third of the feed, " +
  "full-width slots at 75 % of the pocketing chip load, light passes fed up for chip thinning so the chip stays inside the material's band, feeds within 80 % of the machine's maximum.";
const revised = (last: PlannedVersion): PlannedVersion => ({
  chipLoadScale: last.chipLoadScale,
  depthScale: last.depthScale,
  changeNote: REVISION_NOTE,
  derivation: "current",
});

/** The versions to seed: the published history, then (unless withdrawn) the revision; an open draft after that. */
export function seededVersions(sheet: PlannedSheet): PlannedVersion[] {
  const history = sheet.versions.map((v) => ({ ...v, derivation: v.derivation ?? ("first-edition" as const) }));
  const published = sheet.withdrawnReason ? history : [...history, revised(history.at(-1)!)];
  if (!sheet.openDraft) return published;
  return [
    ...published,
    { ...published.at(-1)!, chipLoadScale: 0.85, changeNote: "Feed lowered again after more field results.", derivation: "current" },
  ];
}

/** Number of published versions (the last one current, or withdrawn). */
export const publishedCount = (sheet: PlannedSheet) => seededVersions(sheet).length - (sheet.openDraft ? 1 : 0);

export const demoSheetSlug = (sheet: Pick<PlannedSheet, "cutter" | "material" | "machineClass">) =>
  `${sheet.material}-${sheet.cutter.toLowerCase()}-${sheet.machineClass}`;

/** The plastics sheet of the melting story (seeds/seed-bench.ts, seeds/seed-field.ts): v1 rubbed and welded, v2 cut. */
export const meltingStorySlug = (vendor: string) => {
  const sheet = DEMO_SHEET_PLAN[vendor]?.find((s) => s.versions.includes(CHIP_UP));
  return sheet ? demoSheetSlug(sheet) : undefined;
};

const KINDS: Record<string, OperationKind[]> = {
  single: ["slotting", "profile"],
  two: ["pocket", "profile"],
  three: ["constant-engagement", "slotting", "finishing"],
  ball: ["finishing", "pocket"],
  compression: ["profile", "pocket"],
};

const kindOf = (sku: string) =>
  /-(SF|O1)-/.test(sku)
    ? "single"
    : /-(3F|E3)-/.test(sku)
      ? "three"
      : /-(BN|B2)-/.test(sku)
        ? "ball"
        : /-(CMP|CP)-/.test(sku)
          ? "compression"
          : "two";

type Row = [cutter: string, material: string, machineClass: string];

function plan(rows: Row[], extra: Record<number, Partial<PlannedSheet>> = {}): PlannedSheet[] {
  return rows.map(([cutter, material, machineClass], i) => {
    // Every fourth sheet has a second version, every seventh a third.
    const versions = i % 7 === 3 ? [FIRST, FEED_DOWN, DEPTH_DOWN] : i % 4 === 1 ? [FIRST, FEED_DOWN] : [FIRST];
    return { cutter, material, machineClass, kinds: KINDS[kindOf(cutter)], versions, ...extra[i] };
  });
}

export const DEMO_SHEET_PLAN: Record<string, PlannedSheet[]> = {
  northbeck: plan(
    [
      ["NB-SF-3175", "cast-acrylic", "light-router"],
      ["NB-SF-3175", "cast-acrylic", "rigid-router"],
      ["NB-SF-3175", "polycarbonate", "light-router"],
      ["NB-SF-3175", "hdpe", "rigid-router"],
      ["NB-SF-6350", "cast-acrylic", "rigid-router"],
      ["NB-SF-6350", "hdpe", "light-router"],
      ["NB-SF-6350", "polycarbonate", "rigid-router"],
      ["NB-2F-6", "hardwood-oak", "light-router"],
      ["NB-2F-6", "hardwood-oak", "rigid-router"],
      ["NB-2F-6", "mdf", "light-router"],
      ["NB-2F-6", "plywood", "rigid-router"],
      ["NB-2F-6", "g10-glass-epoxy", "rigid-router"],
      ["NB-2F-6", "hdpe", "light-router"],
      ["NB-3F-6", "aluminium-6061", "rigid-router"],
      ["NB-3F-6", "aluminium-6061", "light-router"],
      ["NB-BN-6", "hardwood-oak", "rigid-router"],
      ["NB-BN-6", "mdf", "rigid-router"],
      ["NB-CMP-635", "plywood", "light-router"],
      ["NB-CMP-635", "plywood", "rigid-router"],
      ["NB-CMP-635", "mdf", "rigid-router"],
      ["NB-CMP-635", "hardwood-oak", "rigid-router"],
    ],
    {
      1: { versions: [FIRST, CHIP_UP] },
      11: { withdrawnReason: "G10 dust needs wet cutting or a sealed enclosure on this machine class; a revised sheet is in preparation." },
      16: { openDraft: "in_review" },
    },
  ),
  quillon: plan(
    [
      ["QC-O1-3", "cast-acrylic", "light-router"],
      ["QC-O1-3", "cast-acrylic", "rigid-router"],
      ["QC-O1-3", "polycarbonate", "light-router"],
      ["QC-O1-3", "hdpe", "light-router"],
      ["QC-O1-6", "cast-acrylic", "rigid-router"],
      ["QC-O1-6", "hdpe", "rigid-router"],
      ["QC-O1-6", "polycarbonate", "rigid-router"],
      ["QC-E2-4", "hardwood-maple", "light-router"],
      ["QC-E2-4", "hardwood-maple", "rigid-router"],
      ["QC-E2-4", "mdf", "light-router"],
      ["QC-E2-4", "plywood", "light-router"],
      ["QC-E2-4", "carbon-fibre", "small-machining-centre"],
      ["QC-E3-8", "aluminium-6061", "small-machining-centre"],
      ["QC-E3-8", "aluminium-6061", "rigid-router"],
      ["QC-B2-3", "hardwood-maple", "rigid-router"],
      ["QC-B2-3", "mdf", "light-router"],
      ["QC-CP-8", "plywood", "rigid-router"],
      ["QC-CP-8", "mdf", "rigid-router"],
      ["QC-CP-8", "hardwood-maple", "rigid-router"],
      ["QC-E3-8", "carbon-fibre", "small-machining-centre"],
    ],
    { 1: { versions: [FIRST, CHIP_UP] }, 6: { openDraft: "draft" } },
  ),
};
