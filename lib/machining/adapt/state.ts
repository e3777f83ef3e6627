import type { QuantityKind } from "../quantities";
import type { AdaptNumbers, AdaptStep, AdaptWarning, WarningValue } from "../types";
import type { ResolvedInput } from "./resolve-input";
import { ruleSource, type RuleId } from "./rules-meta";
import type { WarningCode } from "./warning-codes";

/** Working values while the rules run; rules read and change it in order. */
export interface AdaptState extends AdaptNumbers {
  input: ResolvedInput;
  /** hex held from the reference cut (rule 1). */
  targetHexMm: number;
  /** The chip load wanted before any feed cap (rule 2). */
  targetChipLoadMm: number;
  /** Cutting power at the tool, before spindle efficiency, in kW. */
  toolPowerKw: number | null;
  warnings: AdaptWarning[];
  steps: AdaptStep[];
}

type NumericField = { [K in keyof AdaptNumbers]: AdaptNumbers[K] extends number ? K : never }[keyof AdaptNumbers];

// Differences below this share are rounding noise, not a change worth explaining.
const SAME = 1e-9;

/** Records a step when `after` really differs from `before`. */
export function record(s: AdaptState, rule: RuleId, field: keyof AdaptNumbers, quantity: QuantityKind, before: number, after: number, why: string): void {
  if (Math.abs(after - before) > SAME * Math.max(Math.abs(before), Math.abs(after))) {
    s.steps.push({ rule, quantity, field, before, after, why, source: ruleSource(rule) });
  }
}

/** Sets a number and records the step when it actually changes. */
export function change(s: AdaptState, rule: RuleId, field: NumericField, quantity: QuantityKind, after: number, why: string): void {
  const before = s[field];
  s[field] = after;
  record(s, rule, field, quantity, before, after, why);
}

export function warn(s: AdaptState, code: WarningCode, message: string, values?: WarningValue[]): void {
  s.warnings.push(values ? { code, message, values } : { code, message });
}

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
    steps: [],
  };
}
