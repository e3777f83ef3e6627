import { CHIP_BAND_PCT_BY_GROUP } from "@/content-schema/catalogue-material";
import type { OperationKind } from "@/content-schema/sheet-kinds";
import {
  ADAPT_DEFAULTS,
  ballNoseEffectiveDiameter,
  chipLoad,
  chipLoadBand,
  chipThinningFactor,
  cuttingPower,
  cuttingSpeed,
  DEFAULT_KIENZLE_MC,
  defaultZThrustN,
  kienzleKc,
  meanChipThickness,
  peakToothForce,
  plungeFeedPerRevForThrust,
  rigidityClassFromFactor,
  SLOTTING_FACTOR,
  spindlePowerAt,
  spindleSpeed,
  toolDeflection,
  YOUNGS_MODULUS_GPA,
} from "@/lib/machining";

// Pure: starting numbers derived by the engine's own rules (lib/machining/README.md), so a template or a demo sheet never teaches a
// number the engine would warn about on the sheet's reference machine:
//   - n from a cutting speed inside the material's window (judged at De for a ball nose);
//   - the chip the edge sees (hex) inside the material's chip-load band, with a margin on both sides; light
//     passes (small ae) fed up by chip thinning, fz = hex·CTF(ae); a ball nose fed up by D/De;
//   - a full-width slot at the slotting factor of the pocketing chip;
//   - vf at most 80 % of the machine's max feed (n lowered first, within the vc window);
//   - the plunge by fn from the thrust model at 80 % of the machine's Z thrust, never faster than vf;
//   - ap within 80 % of the deflection limit (peak force, stick-out = flute length) and of the usable power at n.
// Used for new-sheet templates and the invented demo data; never a claim that a number is safe.

export type DeriveCutter = { diameterMm: number; flutes: number; cornerForm: string; fluteLengthMm?: number };
export type DeriveMaterial = {
  materialGroup: string;
  vcMinMpm: number;
  vcMaxMpm: number;
  minChipLoadMm: number;
  /** Chip-load band in % of D; absent: the group's typical band. */
  chipLoadMinPctD?: number;
  chipLoadMaxPctD?: number;
  kcNmm2?: number;
  kc11Nmm2?: number;
  mc?: number;
};
export type DeriveMachine = {
  rpmMin: number;
  rpmMax: number;
  maxFeedMmMin: number;
  rigidity: number;
  zThrustN?: number;
  powerKw?: number;
  spindleKind?: "constant-torque" | "constant-power";
  ratedRpm?: number;
};

export type DerivedOperation = {
  kind: OperationKind;
  label?: string;
  n: string;
  vf: string;
  ap: string;
  ae: string;
  plungeFeed?: string;
  entry: "plunge" | "ramp" | "helical" | "pre-drilled" | "none";
  rampAngleDeg?: number;
  /** Numbers behind the strings, for tests and notes. */
  derived: {
    vcMpm: number;
    fzMm: number;
    hexMm: number;
    rpm: number;
    feedMmMin: number;
    apMm: number;
    aeMm: number;
    effectiveDiameterMm: number;
    plungeFeedMmMin: number | null;
  };
};

/** Share of the machine's max feed a derived feed may use (the rest is headroom for the customer's machine). */
export const FEED_SHARE_OF_MAX = 0.8;
/** Share of the machine's Z thrust a derived plunge may use. */
export const THRUST_SHARE = 0.8;
/** Margins inside the chip-load band: hex at least 10 % over the floor and 10 % under the ceiling. */
const FLOOR_MARGIN = 1.1;
const CEILING_MARGIN = 0.9;
/** Where in the band (after margins) a pocketing chip sits: a little under the middle. */
const BAND_POSITION = 0.35;
/** Plastics run in the lower part of the vc window to keep the heat down (common practice). */
const VC_POSITION: Record<string, number> = { plastics: 0.4 };
const METAL = new Set(["non-ferrous", "ferrous"]);

// Axial and radial depth per operation, as multiples of D (metals get half the axial depth, a ball nose less).
const DEPTHS: Partial<
  Record<OperationKind, { ap: number; ballAp: number; ae: number | "full"; entry: DerivedOperation["entry"]; angle?: number }>
> = {
  slotting: { ap: 0.35, ballAp: 0.15, ae: "full", entry: "ramp", angle: 3 },
  pocket: { ap: 0.5, ballAp: 0.2, ae: 0.45, entry: "helical", angle: 2 },
  "constant-engagement": { ap: 1.5, ballAp: 0.3, ae: 0.1, entry: "helical", angle: 2 },
  profile: { ap: 1, ballAp: 0.3, ae: 0.25, entry: "none" },
  finishing: { ap: 1, ballAp: 0.1, ae: 0.05, entry: "none" },
};

const roundTo = (value: number, step: number) => Math.round(value / step) * step;
const floorTo = (value: number, step: number) => Math.floor(value / step + 1e-9) * step;
const ceilTo = (value: number, step: number) => Math.ceil(value / step - 1e-9) * step;
const clamp = (value: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, value));
const mm = (value: number) => `${Number(value.toFixed(2))} mm`;

/** The band's usable part after margins, and the pocketing chip inside it; `hi < lo` for a cutter too small for the band. */
export function chipTargets(material: DeriveMaterial, diameterMm: number, chipLoadScale = 1, bandPosition = BAND_POSITION) {
  const typical = CHIP_BAND_PCT_BY_GROUP[material.materialGroup as keyof typeof CHIP_BAND_PCT_BY_GROUP] ?? { min: 0.5, max: 1.5 };
  const pct = { min: (material.chipLoadMinPctD ?? typical.min) / 100, max: (material.chipLoadMaxPctD ?? typical.max) / 100 };
  const band = chipLoadBand({ minChipLoadMm: material.minChipLoadMm, chipLoadPctOfD: pct }, diameterMm);
  // A cutter whose ceiling is under the floor: stay under the ceiling (a rubbing cutter is better than a broken one).
  if (band.impossible)
    return {
      band,
      lo: band.maxMm * CEILING_MARGIN,
      hi: band.maxMm * CEILING_MARGIN,
      pocket: band.maxMm * CEILING_MARGIN,
      slot: band.maxMm * CEILING_MARGIN,
    };
  // A narrow band (a high absolute floor on a small cutter) shrinks the margins toward its middle.
  const middle = (band.minMm + band.maxMm) / 2;
  const lo = Math.min(band.minMm * FLOOR_MARGIN, middle);
  const hi = Math.max(band.maxMm * CEILING_MARGIN, middle);
  // The pocketing chip leaves room for the slot at the slotting factor above the floor.
  const pocket = clamp(Math.max(lo + bandPosition * (hi - lo), lo / SLOTTING_FACTOR) * chipLoadScale, lo, hi);
  return { band, lo, hi, pocket, slot: Math.max(lo, pocket * SLOTTING_FACTOR) };
}

/** ap at which a ball nose cuts at diameter De: ap = (D − √(D² − De²))/2. */
const apForEffectiveDiameter = (d: number, de: number) => (de >= d ? d / 2 : (d - Math.sqrt(d * d - de * de)) / 2);

/** The specific cutting force the thrust model takes: kc1.1 where known, else the constant kc. */
const thrustKc = (material: DeriveMaterial) => material.kc11Nmm2 ?? material.kcNmm2;

/** Share of each engine limit (deflection, usable power) a derived depth may use. */
const LIMIT_SHARE = 0.8;

/** ap lowered until the peak-force deflection at a stick-out of the flute length and the power at n fit, with margin. */
function limitDepth({
  cutter,
  material,
  machine,
  ap,
  aeMm,
  fz,
  rpm,
  vf,
}: {
  cutter: DeriveCutter;
  material: DeriveMaterial;
  machine: DeriveMachine;
  ap: number;
  aeMm: number;
  fz: number;
  rpm: number;
  vf: number;
}) {
  const kc11 = material.kc11Nmm2 ?? material.kcNmm2;
  if (!kc11) return ap;
  const mc = material.kc11Nmm2 ? (material.mc ?? DEFAULT_KIENZLE_MC) : 0;
  const D = cutter.diameterMm;
  let depth = ap;
  if (cutter.fluteLengthMm) {
    const force = peakToothForce({
      diameterMm: D,
      radialDepthMm: aeMm,
      axialDepthMm: depth,
      chipLoadMm: fz,
      flutes: cutter.flutes,
      kc11Nmm2: kc11,
      mc,
    });
    const deflection = toolDeflection({
      forceN: force,
      stickoutMm: cutter.fluteLengthMm,
      diameterMm: D,
      youngsModulusGPa: YOUNGS_MODULUS_GPA.carbide,
    });
    const allowed = LIMIT_SHARE * ADAPT_DEFAULTS.deflectionLimitMm;
    if (deflection > allowed) depth = (depth * allowed) / deflection;
  }
  if (machine.powerKw) {
    const hm = meanChipThickness({ diameterMm: D, radialDepthMm: aeMm, chipLoadMm: fz });
    const power = cuttingPower({
      axialDepthMm: depth,
      radialDepthMm: aeMm,
      feedMmMin: vf,
      specificCuttingForceNmm2: kienzleKc({ kc11Nmm2: kc11, mc, chipThicknessMm: hm }),
    });
    const available = spindlePowerAt({
      ratedPowerKw: machine.powerKw,
      rpm,
      ratedRpm: machine.ratedRpm ?? machine.rpmMax,
      spindleKind: machine.spindleKind,
    });
    const allowed = LIMIT_SHARE * ADAPT_DEFAULTS.usablePowerFraction * available;
    if (power > allowed) depth = (depth * allowed) / power;
  }
  return depth === ap ? ap : Math.max(0.1, floorTo(depth, 0.1));
}

export type DeriveOptions = {
  cutter: DeriveCutter;
  material: DeriveMaterial;
  machine: DeriveMachine;
  kind: OperationKind;
  /** Where in the vc window to run: 0 = lowest, 1 = highest (default: 0.4 for plastics, else 0.5). */
  vcFraction?: number;
  /** Scales the pocketing chip inside the band (e.g. 0.9 for a later, more careful version). */
  chipLoadScale?: number;
  depthScale?: number;
  label?: string;
  /** An engineer's rule (a sheet family's): depths as multiples of D taken as written, for the engine to judge. */
  rule?: DeriveRule;
};

/** What a family rule may set; absent fields keep the defaults above. */
export type DeriveRule = {
  chipLoadPosition?: number;
  apPerD?: number;
  aePerD?: number;
  entry?: DerivedOperation["entry"];
  rampAngleDeg?: number;
};

export function deriveOperation({
  cutter,
  material,
  machine,
  kind,
  vcFraction,
  chipLoadScale = 1,
  depthScale = 1,
  label,
  rule = {},
}: DeriveOptions): DerivedOperation {
  const D = cutter.diameterMm;
  const z = cutter.flutes;
  const ball = cutter.cornerForm === "ball";
  const base = DEPTHS[kind] ?? DEPTHS.profile!;
  const depth = {
    ...base,
    ae: base.ae === "full" ? base.ae : (rule.aePerD ?? base.ae),
    entry: rule.entry ?? base.entry,
    angle: rule.rampAngleDeg ?? base.angle,
  };
  const vcLo = material.vcMinMpm * 1.05;
  const vcHi = material.vcMaxMpm * 0.95;
  const vfCap = FEED_SHARE_OF_MAX * machine.maxFeedMmMin;
  const vc = material.vcMinMpm + (vcFraction ?? VC_POSITION[material.materialGroup] ?? 0.5) * (material.vcMaxMpm - material.vcMinMpm);

  // Depths. A ball nose cuts at De < D when shallow: go deep enough that vc(De) reaches the window at top speed.
  const metalFactor = METAL.has(material.materialGroup) ? 0.5 : 1;
  const ruleAp = rule.apPerD === undefined ? null : Math.max(0.1, roundTo(D * rule.apPerD, 0.1));
  let ap = ruleAp ?? Math.max(0.1, roundTo(D * (ball ? depth.ballAp : depth.ap) * metalFactor * machine.rigidity * depthScale, 0.1));
  if (ball) ap = Math.max(ap, ceilTo(apForEffectiveDiameter(D, (1000 * vcLo) / (Math.PI * machine.rpmMax)), 0.1));
  if (cutter.fluteLengthMm && ruleAp === null) ap = Math.min(ap, floorTo(cutter.fluteLengthMm * 0.9, 0.1));
  if (ball) ap = Math.min(ap, D / 2);
  const slot = depth.ae === "full";
  const targets = chipTargets(material, D, chipLoadScale, rule.chipLoadPosition);

  // The cut at one ap (a ball nose's De, and so its n and chip, depend on ap).
  const cutAt = (apMm: number) => {
    let aeMm = slot ? D : roundTo(D * (depth.ae as number), 0.05);
    const de = ball ? ballNoseEffectiveDiameter({ diameterMm: D, axialDepthMm: apMm }) : D;
    // Chip: hex inside the band; fz fed up by chip thinning (and by D/De for a ball nose).
    const feedUp = (ae: number) => (slot ? 1 : chipThinningFactor({ diameterMm: D, radialDepthMm: ae })) * (D / de);
    let fz = (slot ? targets.slot : targets.pocket) * feedUp(aeMm);
    // Speed from vc at De, then the feed cap: lower n first (not under the vc window), then the chip.
    const nAt = (v: number) => spindleSpeed({ diameterMm: de, cuttingSpeedMpm: v });
    const nIdeal = clamp(nAt(vc), machine.rpmMin, machine.rpmMax);
    const nLowest = Math.min(nIdeal, Math.max(machine.rpmMin, nAt(vcLo)));
    let rpm = fz * z * nIdeal <= vfCap ? nIdeal : Math.max(nLowest, vfCap / (fz * z));
    if (fz * z * rpm > vfCap) {
      // Even at the lowest speed the chip is too big for the feed: take the chip down toward the floor, and where
      // that is still too much, widen a light pass until its chip thinning fits (the chip the edge sees stays in band).
      const fzCap = vfCap / (z * rpm);
      const hex = Math.max(targets.lo, fzCap / feedUp(aeMm));
      if (!slot && hex * feedUp(aeMm) > fzCap) {
        const need = fzCap / (hex * (D / de));
        aeMm = need <= 1 ? D / 2 : Math.min(D / 2, ceilTo((D * (1 - Math.sqrt(1 - 1 / (need * need)))) / 2, 0.05));
      }
      fz = Math.min(fzCap, hex * feedUp(aeMm));
    }
    rpm = clamp(roundTo(rpm, 100), machine.rpmMin, Math.min(machine.rpmMax, ceilTo(nAt(vcHi), 100)));
    const vf = Math.min(floorTo(vfCap, 10), roundTo(fz * z * rpm, 10));
    return { ap: apMm, aeMm, de, rpm, vf, feedUp, hex: chipLoad({ feedMmMin: vf, rpm, flutes: z }) / feedUp(aeMm) };
  };
  let cut = cutAt(ap);
  // A shallow ball nose whose chip cannot reach the band within the feed cap cuts deeper (larger De, lower n).
  while (ball && cut.hex < targets.lo && cut.ap + 0.1 <= D / 2 + 1e-9) cut = cutAt(roundTo(cut.ap + 0.1, 0.1));
  const { aeMm, de, rpm, vf, feedUp } = cut;
  const fz = chipLoad({ feedMmMin: vf, rpm, flutes: z });
  ap = cut.ap;

  // A rule's depth stands as written: the engine's check of the whole sheet says whether it is too much.
  if (ruleAp === null) ap = limitDepth({ cutter, material, machine, ap, aeMm, fz, rpm, vf });

  // Plunge: fn whose thrust on the reference machine's Z is 80 % of what it can push; never faster than vf.
  const kc = thrustKc(material);
  const zThrust = machine.zThrustN ?? defaultZThrustN(rigidityClassFromFactor(machine.rigidity));
  const fn = kc ? plungeFeedPerRevForThrust({ diameterMm: D, kcNmm2: kc, zThrustN: THRUST_SHARE * zThrust }) : null;
  const plunge = fn === null ? null : Math.max(10, floorTo(Math.min(fn * rpm, vf), 10));
  // Where even the centre of the cutter needs more thrust than the Z has, the sheet enters by ramp only.
  const entry = fn === null && depth.entry !== "none" ? "ramp" : depth.entry;

  return {
    kind,
    label,
    n: `${rpm} rpm`,
    vf: `${vf} mm/min`,
    ap: mm(ap),
    ae: slot ? "100 %" : mm(aeMm),
    plungeFeed: plunge === null ? undefined : `${plunge} mm/min`,
    entry,
    rampAngleDeg: entry === "ramp" || entry === "helical" ? (depth.angle ?? 2) : undefined,
    derived: {
      vcMpm: cuttingSpeed({ diameterMm: de, rpm }),
      fzMm: fz,
      hexMm: fz / feedUp(aeMm),
      rpm,
      feedMmMin: vf,
      apMm: ap,
      aeMm,
      effectiveDiameterMm: de,
      plungeFeedMmMin: plunge,
    },
  };
}
