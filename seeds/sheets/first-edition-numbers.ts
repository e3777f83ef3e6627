// Invented demo data: how the demo sheets' numbers were derived when they were first published, before the
// cutting-data model was revised (plunge at a third of the feed, slots fed like pockets, one chip load per
// group for every pass). Kept only to seed the versions published then, so their history (and the Field-results
// stories about them) stays as it was; every current demo version comes from lib/sheets/derive-starting-data.ts.
import type { OperationKind } from "@/content-schema/sheet-kinds";
import { chipLoad, feedRate, spindleSpeed } from "@/lib/machining";
import type { DeriveCutter, DerivedOperation, DeriveMachine, DeriveMaterial } from "@/lib/sheets/derive-starting-data";

const CHIP_LOAD_PER_DIAMETER: Record<string, number> = {
  plastics: 0.02,
  wood: 0.016,
  "non-ferrous": 0.006,
  composites: 0.008,
  ferrous: 0.004,
};
const METAL = new Set(["non-ferrous", "ferrous"]);

const round = (value: number, step: number) => Math.round(value / step) * step;
const mm = (value: number) => `${Number(value.toFixed(2))} mm`;

const DEPTHS: Partial<Record<OperationKind, { ap: number; ae: number | "full"; entry: DerivedOperation["entry"]; angle?: number }>> = {
  slotting: { ap: 0.5, ae: "full", entry: "ramp", angle: 3 },
  pocket: { ap: 0.5, ae: 0.45, entry: "helical", angle: 2 },
  "constant-engagement": { ap: 1.5, ae: 0.1, entry: "helical", angle: 2 },
  profile: { ap: 1, ae: 0.25, entry: "none" },
  finishing: { ap: 1, ae: 0.05, entry: "none" },
};

type Options = {
  cutter: DeriveCutter;
  material: DeriveMaterial;
  machine: DeriveMachine;
  kind: OperationKind;
  chipLoadScale?: number;
  depthScale?: number;
};

export function firstEditionOperation({ cutter, material, machine, kind, chipLoadScale = 1, depthScale = 1 }: Options): DerivedOperation {
  const D = cutter.diameterMm;
  const z = cutter.flutes;
  const vc = material.vcMinMpm + 0.5 * (material.vcMaxMpm - material.vcMinMpm);
  let rpm = Math.min(machine.rpmMax, Math.max(machine.rpmMin, spindleSpeed({ diameterMm: D, cuttingSpeedMpm: vc })));
  const fz = Math.max(material.minChipLoadMm * 1.1, (CHIP_LOAD_PER_DIAMETER[material.materialGroup] ?? 0.01) * D * chipLoadScale);
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
    n: `${rpm} rpm`,
    vf: `${vf} mm/min`,
    ap: mm(ap),
    ae,
    plungeFeed: `${plunge} mm/min`,
    entry: depth.entry,
    rampAngleDeg: depth.angle,
    derived: {
      vcMpm: vc,
      fzMm: chipLoad({ feedMmMin: vf, rpm, flutes: z }),
      hexMm: chipLoad({ feedMmMin: vf, rpm, flutes: z }),
      rpm,
      feedMmMin: vf,
      apMm: ap,
      aeMm: depth.ae === "full" ? D : round(D * depth.ae, 0.05),
      effectiveDiameterMm: D,
      plungeFeedMmMin: plunge,
    },
  };
}
