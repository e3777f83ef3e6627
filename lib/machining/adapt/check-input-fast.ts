import { toOperationKind } from "../operation-kinds";
import { CORNER_FORMS, ENTRY_CAPABILITIES, ENTRY_KINDS, RIGIDITY_CLASS_KEYS, SPINDLE_KINDS, type AdaptInput } from "../types";
import { MAX } from "./check-input";
import { DIAMETER_RANGE_MM, MAX_STICKOUT_DIAMETERS } from "./defaults";

// A finite number in (0, max] (NaN and ±Infinity fail the comparisons); the typeof keeps "5" from coercing.
const inRange = (v: unknown, max: number): boolean => typeof v === "number" && v > 0 && v <= max;
const optInRange = (v: unknown, max: number): boolean => v === undefined || inRange(v, max);
const nonNegativeFinite = (v: unknown): boolean => typeof v === "number" && v >= 0 && v < Infinity;
const optOneOf = (v: unknown, list: readonly string[]): boolean => v === undefined || (typeof v === "string" && list.includes(v));
const isSection = (v: unknown): boolean => typeof v === "object" && v !== null;

/**
 * True only when `checkInput` would accept the input: the same tests in one pass, without building
 * messages or intermediate values. On false the caller runs `checkInput`, which throws the exact error,
 * so this only decides how fast a valid input gets through, never what an invalid one is told.
 */
export function passesInputChecks(input: AdaptInput): boolean {
  const op = input.operation;
  const material = input.material;
  const ref = input.referenceMachine;
  const machine = input.machine;
  const overrides = input.overrides;
  if (!isSection(op) || !isSection(material) || !isSection(ref) || !isSection(machine)) return false;
  if (overrides !== undefined && !isSection(overrides)) return false;
  if (typeof op.kind !== "string" || toOperationKind(op.kind) === undefined) return false;
  const d = op.diameterMm;
  if (!inRange(d, MAX.lengthMm) || d < DIAMETER_RANGE_MM[0] || d > DIAMETER_RANGE_MM[1]) return false;
  if (!inRange(op.flutes, 1000) || !Number.isInteger(op.flutes)) return false;
  if (!inRange(op.rpm, MAX.rpm) || !inRange(op.feedMmMin, MAX.feedMmMin)) return false;
  const ap = op.axialDepthMm;
  if (!inRange(ap, MAX.lengthMm)) return false;
  if (!inRange(op.radialDepthMm, Infinity) || op.radialDepthMm > d * (1 + 1e-12)) return false;
  if (!optInRange(op.plungeFeedMmMin, MAX.feedMmMin) || !optInRange(op.stickoutMm, MAX.lengthMm)) return false;
  const flute = op.fluteLengthMm;
  if (!optInRange(flute, MAX.lengthMm)) return false;
  if (!optOneOf(op.cornerForm, CORNER_FORMS) || !optOneOf(op.entry, ENTRY_KINDS)) return false;
  if (!optInRange(op.rampAngleDeg, 90)) return false;
  const r = op.cornerRadiusMm;
  if (r !== undefined && (!nonNegativeFinite(r) || !(r <= (d / 2) * (1 + 1e-9)))) return false;
  if (flute !== undefined && ap > flute * (1 + 1e-9)) return false;
  const window = material.cuttingSpeedWindowMpm;
  if (window !== undefined) {
    if (!isSection(window)) return false;
    const lo = window[0];
    const hi = window[1];
    if (!inRange(lo, MAX.mpm) || !inRange(hi, MAX.mpm) || lo > hi) return false;
  }
  if (!optInRange(material.minChipLoadMm, MAX.lengthMm)) return false;
  if (!optInRange(material.specificCuttingForceNmm2, MAX.kcNmm2) || !optInRange(material.kc11Nmm2, MAX.kcNmm2)) return false;
  const mc = material.mc;
  if (mc !== undefined && (!nonNegativeFinite(mc) || mc >= 1)) return false;
  const band = material.chipLoadPctOfD;
  if (band !== undefined && (!isSection(band) || !inRange(band.min, 1) || !inRange(band.max, 1) || band.min > band.max)) return false;
  if (!inRange(ref.rigidity, 1) || !optOneOf(ref.rigidityClass, RIGIDITY_CLASS_KEYS)) return false;
  if (!optInRange(ref.zThrustN, MAX.forceN) || !optInRange(ref.maxFeedMmMin, MAX.feedMmMin) || !optInRange(ref.maxRpm, MAX.rpm))
    return false;
  if (!inRange(machine.minRpm, MAX.rpm) || !inRange(machine.maxRpm, MAX.rpm) || machine.minRpm > machine.maxRpm) return false;
  if (!optInRange(machine.ratedRpm, MAX.rpm)) return false;
  if (!optOneOf(machine.spindleKind, SPINDLE_KINDS) || !optOneOf(machine.rigidityClass, RIGIDITY_CLASS_KEYS)) return false;
  if (!inRange(machine.maxFeedMmMin, MAX.feedMmMin) || !inRange(machine.spindlePowerKw, MAX.powerKw)) return false;
  if (!inRange(machine.rigidity, 1) || !optInRange(machine.zThrustN, MAX.forceN)) return false;
  if (!optOneOf(input.entryCapability, ENTRY_CAPABILITIES)) return false;
  let stickout = op.stickoutMm;
  if (overrides !== undefined) {
    const ae = overrides.radialDepthMm;
    if (ae !== undefined && (!inRange(ae, Infinity) || ae > d * (1 + 1e-12))) return false;
    const apOverride = overrides.axialDepthMm;
    if (!optInRange(apOverride, MAX.lengthMm)) return false;
    if (flute !== undefined && apOverride !== undefined && apOverride > flute * (1 + 1e-9)) return false;
    if (!optInRange(overrides.stickoutMm, MAX.lengthMm)) return false;
    stickout = overrides.stickoutMm ?? stickout;
  }
  return stickout === undefined || stickout <= MAX_STICKOUT_DIAMETERS * d;
}
