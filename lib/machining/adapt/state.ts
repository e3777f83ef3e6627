import type { QuantityKind } from "../quantities";
import type { AdaptNumbers, AdaptStep, AdaptWarning, WarningValue } from "../types";
import type { ResolvedInput } from "./resolve-input";
import { ruleSource, type RuleId } from "./rules-meta";
import { WARNING_CODE_LIST, type WarningCode } from "./warning-codes";

/** Working values while the rules run; rules read and change it in order. */
export interface AdaptState extends AdaptNumbers {
  input: ResolvedInput;
  /** hex held from the reference cut (rule 1), lowered by the slotting factor (rule 2). */
  targetHexMm: number;
  /** The chip load wanted before any feed cap (rule 2). */
  targetChipLoadMm: number;
  /** Cutting power at the tool, before spindle efficiency, in kW. */
  toolPowerKw: number | null;
  warnings: AdaptWarning[];
  /** One bit per warning code given so far (WARNING_BIT), so a repeat is found without a scan. */
  warned: number;
  steps: AdaptStep[];
  /** The ae of the last engagement angle worked out (NaN before any), and that angle: most rules ask at the same ae. */
  phiAeMm: number;
  phi: number;
  /** The chip thickness of the last kc(h) worked out (NaN before any), and that kc: rule 9 asks twice at the same h. */
  kcHMm: number;
  kc: number;
}

type NumericField = { [K in keyof AdaptNumbers]: AdaptNumbers[K] extends number ? K : never }[keyof AdaptNumbers];

// Differences below this share are rounding noise, not a change worth explaining.
const SAME = 1e-9;

/** Records a step when `after` really differs from `before`. */
export function record(
  s: AdaptState,
  rule: RuleId,
  field: keyof AdaptNumbers,
  quantity: QuantityKind,
  before: number,
  after: number,
  why: string,
): void {
  if (Math.abs(after - before) > SAME * Math.max(Math.abs(before), Math.abs(after))) {
    s.steps.push({ rule, quantity, field, before, after, why, source: ruleSource(rule) });
  }
}

/** Sets a number and records the step when it actually changes. */
export function change(s: AdaptState, rule: RuleId, field: NumericField, quantity: QuantityKind, after: number, why: string): void {
  // The fields the rules change, by name: a keyed s[field] from many call sites is a slow generic access.
  let before: number;
  switch (field) {
    case "rpm":
      before = s.rpm;
      s.rpm = after;
      break;
    case "feedMmMin":
      before = s.feedMmMin;
      s.feedMmMin = after;
      break;
    case "chipLoadMm":
      before = s.chipLoadMm;
      s.chipLoadMm = after;
      break;
    case "axialDepthMm":
      before = s.axialDepthMm;
      s.axialDepthMm = after;
      break;
    case "maxChipThicknessMm":
      before = s.maxChipThicknessMm;
      s.maxChipThicknessMm = after;
      break;
    default:
      before = s[field];
      s[field] = after;
  }
  record(s, rule, field, quantity, before, after, why);
}

// One bit per code: bitwise operators work on 32 bits, so at most 32 codes (a test holds the count there).
const WARNING_BIT: ReadonlyMap<string, number> = new Map(WARNING_CODE_LIST.map((code, i) => [code, 2 ** i]));

const bitOf = (code: WarningCode): number => WARNING_BIT.get(code) ?? 0;

/** Adds a warning once per code (the first one stands: later rules only repeat it). */
export function warn(s: AdaptState, code: WarningCode, message: string, values?: WarningValue[], field?: string): void {
  const bit = bitOf(code);
  if ((s.warned & bit) !== 0) return;
  s.warned |= bit;
  const warning: AdaptWarning = { code, message };
  if (values) warning.values = values;
  if (field) warning.field = field;
  s.warnings.push(warning);
}

export function hasWarning(s: AdaptState, code: WarningCode): boolean {
  return (s.warned & bitOf(code)) !== 0;
}

// Chip geometry at the state's current numbers (Altintas ch. 2; ball nose: Machinery's Handbook).

/** hex/fz from the radial engagement: sin φs below half width, 1 from there on. */
export const radialFactor = (aeMm: number, dMm: number) => {
  const r = aeMm / dMm;
  return r >= 0.5 ? 1 : 2 * Math.sqrt(r * (1 - r));
};

/** Diameter that cuts: De = 2·√(ap·(D − ap)) for a ball nose under ap = D/2, else D. */
export const effectiveDiameter = (s: AdaptState, apMm: number) => {
  const d = s.input.operation.diameterMm;
  return s.input.ballNose && apMm < d / 2 ? 2 * Math.sqrt(apMm * (d - apMm)) : d;
};

/** hex/fz at the given ae and ap: radial thinning times De/D for a ball nose at a shallow cut. */
export const hexFactor = (s: AdaptState, aeMm: number, apMm: number) => {
  const d = s.input.operation.diameterMm;
  return radialFactor(aeMm, d) * (effectiveDiameter(s, apMm) / d);
};

/** φs = arccos(1 − 2·ae/D), π from ae = D on; the last one is kept, since most calls repeat the state's ae. */
export const engagementAngleAt = (s: AdaptState, aeMm: number) => {
  if (aeMm === s.phiAeMm) return s.phi;
  const phi = Math.acos(1 - 2 * Math.min(1, aeMm / s.input.operation.diameterMm));
  s.phiAeMm = aeMm;
  s.phi = phi;
  return phi;
};

/** hm/fz = (1 − cos φs)/φs = 2·(ae/D)/φs, times De/D for a ball nose at a shallow cut. */
export const meanFactor = (s: AdaptState, aeMm: number, apMm: number) => {
  const d = s.input.operation.diameterMm;
  const r = Math.min(1, aeMm / d);
  return ((2 * r) / engagementAngleAt(s, aeMm)) * (effectiveDiameter(s, apMm) / d);
};

/** kc(h) = kc1.1·h^(−mc) (Kienzle 1952); the constant kc when mc = 0. */
export const kcAt = (s: AdaptState, hMm: number) => {
  const f = s.input.force;
  if (f === null) return null;
  if (f.mc === 0) return f.kc11Nmm2;
  if (hMm === s.kcHMm) return s.kc;
  const kc = f.kc11Nmm2 * hMm ** -f.mc;
  s.kcHMm = hMm;
  s.kc = kc;
  return kc;
};

/** The state before rule 1: the sheet's numbers, nothing computed yet. */
export function createState(input: ResolvedInput): AdaptState {
  const op = input.operation;
  return {
    input,
    targetHexMm: 0,
    targetChipLoadMm: 0,
    toolPowerKw: null,
    rpm: op.rpm,
    feedMmMin: op.feedMmMin,
    chipLoadMm: 0,
    maxChipThicknessMm: 0,
    cuttingSpeedMpm: 0,
    axialDepthMm: op.axialDepthMm,
    radialDepthMm: op.radialDepthMm,
    plungeFeedMmMin: null,
    mrrCm3Min: 0,
    powerKw: null,
    torqueNm: null,
    forceN: null,
    deflectionMm: null,
    meanChipThicknessMm: 0,
    effectiveDiameterMm: op.diameterMm,
    peakForceN: null,
    availablePowerKw: null,
    plungeThrustN: null,
    plungeFeedPerRevMm: null,
    warnings: [],
    warned: 0,
    steps: [],
    phiAeMm: Number.NaN,
    phi: 0,
    kcHMm: Number.NaN,
    kc: 0,
  };
}
