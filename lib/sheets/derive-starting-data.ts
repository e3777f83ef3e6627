import type { OperationKind } from "@/content-schema/sheet-kinds";
import { chipLoad, feedRate, spindleSpeed } from "@/lib/machining";

// Pure: starting numbers derived from the formulas in DOMAIN.md (n = 1000·vc/(π·D), vf = fz·z·n),
// a cutting speed inside the material's window and a chip load from a typical range per material group.
// Used for new-sheet templates and for the invented demo data; never a claim that a number is safe.

export type DeriveCutter = { diameterMm: number; flutes: number; cornerForm: string };
export type DeriveMaterial = { materialGroup: string; vcMinMpm: number; vcMaxMpm: number; minChipLoadMm: number };
export type DeriveMachine = { rpmMin: number; rpmMax: number; maxFeedMmMin: number; rigidity: number };

/** fz as a fraction of D, middle of a typical router chip-load range per group (approximate, from memory). */
export const CHIP_LOAD_PER_DIAMETER: Record<string, number> = { plastics: 0.02, wood: 0.016, "non-ferrous": 0.006, composites: 0.008, ferrous: 0.004 };
const METAL = new Set(["non-ferrous", "ferrous"]);

export type DerivedOperation = {
  kind: OperationKind;
  label?: string;
  n: string;
  vf: string;
  ap: string;
  ae: string;
  plungeFeed: string;
  entry: "plunge" | "ramp" | "helical" | "pre-drilled" | "none";
  rampAngleDeg?: number;
  /** Numbers behind the strings, for tests and notes. */
  derived: { vcMpm: number; fzMm: number; rpm: number; feedMmMin: number };
};

const round = (value: number, step: number) => Math.round(value / step) * step;
const mm = (value: number) => `${Number(value.toFixed(2))} mm`;

// Axial and radial depth per operation, as multiples of D (metals get half the axial depth).
const DEPTHS: Partial<Record<OperationKind, { ap: number; ae: number | "full"; entry: DerivedOperation["entry"]; angle?: number }>> = {
  slotting: { ap: 0.5, ae: "full", entry: "ramp", angle: 3 },
  pocket: { ap: 0.5, ae: 0.45, entry: "helical", angle: 2 },
  "constant-engagement": { ap: 1.5, ae: 0.1, entry: "helical", angle: 2 },
  profile: { ap: 1, ae: 0.25, entry: "none" },
  finishing: { ap: 1, ae: 0.05, entry: "none" },
};

export type DeriveOptions = {
  cutter: DeriveCutter;
  material: DeriveMaterial;
  machine: DeriveMachine;
  kind: OperationKind;
  /** Where in the vc window to run: 0 = lowest, 1 = highest. */
  vcFraction?: number;
  /** Scales the typical chip load (e.g. 0.9 for a later, more careful version). */
  chipLoadScale?: number;
  depthScale?: number;
  label?: string;
};

export function deriveOperation({ cutter, material, machine, kind, vcFraction = 0.5, chipLoadScale = 1, depthScale = 1, label }: DeriveOptions): DerivedOperation {
  const D = cutter.diameterMm;
  const z = cutter.flutes;
  const vc = material.vcMinMpm + vcFraction * (material.vcMaxMpm - material.vcMinMpm);
  let rpm = Math.min(machine.rpmMax, Math.max(machine.rpmMin, spindleSpeed({ diameterMm: D, cuttingSpeedMpm: vc })));
  const fz = Math.max(material.minChipLoadMm * 1.1, (CHIP_LOAD_PER_DIAMETER[material.materialGroup] ?? 0.01) * D * chipLoadScale);
  // Over the machine's feed limit: lower n rather than fz, so the cutter keeps cutting instead of rubbing.
  if (feedRate({ rpm, flutes: z, chipLoadMm: fz }) > machine.maxFeedMmMin) rpm = Math.max(machine.rpmMin, machine.maxFeedMmMin / (z * fz));
  rpm = round(rpm, 100);
  const vf = Math.min(machine.maxFeedMmMin, round(feedRate({ rpm, flutes: z, chipLoadMm: fz }), 10));
  const depth = DEPTHS[kind] ?? DEPTHS.profile!;
  const metalFactor = METAL.has(material.materialGroup) ? 0.5 : 1;
  const ballFactor = cutter.cornerForm === "ball" ? 0.4 : 1;
  const ap = Math.max(0.1, round(D * depth.ap * metalFactor * ballFactor * machine.rigidity * depthScale, 0.1));
  const ae = depth.ae === "full" ? "100 %" : mm(round(D * depth.ae, 0.05));
  const plunge = round(vf / (METAL.has(material.materialGroup) ? 4 : 3), 10);
  return {
    kind,
    label,
    n: `${rpm} rpm`,
    vf: `${vf} mm/min`,
    ap: mm(ap),
    ae,
    plungeFeed: `${plunge} mm/min`,
    entry: depth.entry,
    rampAngleDeg: depth.angle,
    derived: { vcMpm: vc, fzMm: chipLoad({ feedMmMin: vf, rpm, flutes: z }), rpm, feedMmMin: vf },
  };
}
