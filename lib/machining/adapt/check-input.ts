import { MachiningInputError } from "../errors";
import { OPERATION_KINDS, toOperationKind } from "../operation-kinds";
import type { UnitSystem } from "../quantities";
import { CORNER_FORMS, ENTRY_CAPABILITIES, ENTRY_KINDS, RIGIDITY_CLASS_KEYS, SPINDLE_KINDS, type AdaptInput } from "../types";
import { bounded, count, fraction, nonNegative, ordered, positive, show } from "../validate";
import { DIAMETER_RANGE_MM, MAX_STICKOUT_DIAMETERS } from "./defaults";
import { say } from "./message-units";

// Generous ceilings: far beyond any cutter or machine, low enough that no product overflows.
export const MAX = {
  lengthMm: 10_000,
  rpm: 1_000_000,
  feedMmMin: 10_000_000,
  kcNmm2: 100_000,
  powerKw: 10_000,
  forceN: 10_000_000,
  mpm: 100_000,
};

const optionalBounded = (value: number | undefined, field: string, max: number) =>
  value === undefined ? undefined : bounded(value, field, max);

const section = (value: unknown, field: string) => {
  if (typeof value !== "object" || value === null) throw new MachiningInputError(field, `${field} is required.`);
};

const oneOf = (value: string | undefined, list: readonly string[], field: string) => {
  if (value !== undefined && !list.includes(value)) throw new MachiningInputError(field, `${field} must be one of ${list.join(", ")}.`);
};

/** Radial depth in (0, D], the message in the caller's units. */
function radialDepthIn(ae: number, d: number, field: string, units: UnitSystem): void {
  positive(ae, field);
  if (ae > d * (1 + 1e-12)) {
    throw new MachiningInputError(
      field,
      `${field} (${say(units, ae, "length")}) cannot exceed the cutter diameter (${say(units, d, "length")}).`,
    );
  }
}

/**
 * Checks operation, material and machines, including rule 12's refusals (a cutter outside
 * 0.1–100 mm, ap above the flute length, stick-out above 20·D): they are checked before rule 1 so
 * nothing is computed on inputs that would be refused. Throws MachiningInputError naming the field.
 */
export function checkInput(input: AdaptInput, units: UnitSystem): void {
  const { operation: op, material, referenceMachine: ref, machine, overrides = {} } = input;
  section(op, "operation");
  section(material, "material");
  section(ref, "referenceMachine");
  section(machine, "machine");
  if (typeof op.kind !== "string" || toOperationKind(op.kind) === undefined) {
    throw new MachiningInputError("operation.kind", `operation.kind must be one of ${OPERATION_KINDS.join(", ")}.`);
  }
  const d = bounded(op.diameterMm, "operation.diameterMm", MAX.lengthMm);
  if (d < DIAMETER_RANGE_MM[0] || d > DIAMETER_RANGE_MM[1]) {
    throw new MachiningInputError(
      "operation.diameterMm",
      `operation.diameterMm (${say(units, d, "length")}) is outside the cutters the engine adapts, ${say(units, DIAMETER_RANGE_MM[0], "length")} to ${say(units, DIAMETER_RANGE_MM[1], "length")}.`,
    );
  }
  count(op.flutes, "operation.flutes");
  bounded(op.flutes, "operation.flutes", 1000);
  bounded(op.rpm, "operation.rpm", MAX.rpm);
  bounded(op.feedMmMin, "operation.feedMmMin", MAX.feedMmMin);
  const ap = bounded(op.axialDepthMm, "operation.axialDepthMm", MAX.lengthMm);
  radialDepthIn(op.radialDepthMm, d, "operation.radialDepthMm", units);
  optionalBounded(op.plungeFeedMmMin, "operation.plungeFeedMmMin", MAX.feedMmMin);
  optionalBounded(op.stickoutMm, "operation.stickoutMm", MAX.lengthMm);
  const flute = optionalBounded(op.fluteLengthMm, "operation.fluteLengthMm", MAX.lengthMm);
  oneOf(op.cornerForm, CORNER_FORMS, "operation.cornerForm");
  oneOf(op.entry, ENTRY_KINDS, "operation.entry");
  if (op.rampAngleDeg !== undefined) fraction(op.rampAngleDeg, "operation.rampAngleDeg", 90);
  if (op.cornerRadiusMm !== undefined && !(nonNegative(op.cornerRadiusMm, "operation.cornerRadiusMm") <= (d / 2) * (1 + 1e-9))) {
    throw new MachiningInputError(
      "operation.cornerRadiusMm",
      `operation.cornerRadiusMm (${say(units, op.cornerRadiusMm, "length")}) must be between 0 and half the diameter (${say(units, d / 2, "length")}).`,
    );
  }
  if (flute !== undefined && ap > flute * (1 + 1e-9)) {
    throw new MachiningInputError(
      "operation.axialDepthMm",
      `operation.axialDepthMm (${say(units, ap, "length")}) is deeper than the flute length (${say(units, flute, "length")}): the shank would rub.`,
    );
  }
  const window = material.cuttingSpeedWindowMpm;
  if (window !== undefined) {
    bounded(window[0], "material.cuttingSpeedWindowMpm.0", MAX.mpm);
    bounded(window[1], "material.cuttingSpeedWindowMpm.1", MAX.mpm);
    ordered(window[0], window[1], "material.cuttingSpeedWindowMpm.0", "material.cuttingSpeedWindowMpm.1");
  }
  optionalBounded(material.minChipLoadMm, "material.minChipLoadMm", MAX.lengthMm);
  optionalBounded(material.specificCuttingForceNmm2, "material.specificCuttingForceNmm2", MAX.kcNmm2);
  optionalBounded(material.kc11Nmm2, "material.kc11Nmm2", MAX.kcNmm2);
  if (material.mc !== undefined) {
    nonNegative(material.mc, "material.mc");
    if (material.mc >= 1) throw new MachiningInputError("material.mc", `material.mc must be under 1 (got ${show(material.mc)}).`);
  }
  const band = material.chipLoadPctOfD;
  if (band !== undefined) {
    section(band, "material.chipLoadPctOfD");
    fraction(band.min, "material.chipLoadPctOfD.min");
    fraction(band.max, "material.chipLoadPctOfD.max");
    ordered(band.min, band.max, "material.chipLoadPctOfD.min", "material.chipLoadPctOfD.max");
  }
  fraction(ref.rigidity, "referenceMachine.rigidity");
  oneOf(ref.rigidityClass, RIGIDITY_CLASS_KEYS, "referenceMachine.rigidityClass");
  optionalBounded(ref.zThrustN, "referenceMachine.zThrustN", MAX.forceN);
  optionalBounded(ref.maxFeedMmMin, "referenceMachine.maxFeedMmMin", MAX.feedMmMin);
  optionalBounded(ref.maxRpm, "referenceMachine.maxRpm", MAX.rpm);
  bounded(machine.minRpm, "machine.minRpm", MAX.rpm);
  bounded(machine.maxRpm, "machine.maxRpm", MAX.rpm);
  ordered(machine.minRpm, machine.maxRpm, "machine.minRpm", "machine.maxRpm");
  optionalBounded(machine.ratedRpm, "machine.ratedRpm", MAX.rpm);
  oneOf(machine.spindleKind, SPINDLE_KINDS, "machine.spindleKind");
  oneOf(machine.rigidityClass, RIGIDITY_CLASS_KEYS, "machine.rigidityClass");
  bounded(machine.maxFeedMmMin, "machine.maxFeedMmMin", MAX.feedMmMin);
  bounded(machine.spindlePowerKw, "machine.spindlePowerKw", MAX.powerKw);
  fraction(machine.rigidity, "machine.rigidity");
  optionalBounded(machine.zThrustN, "machine.zThrustN", MAX.forceN);
  oneOf(input.entryCapability, ENTRY_CAPABILITIES, "entryCapability");
  if (overrides.radialDepthMm !== undefined) radialDepthIn(overrides.radialDepthMm, d, "overrides.radialDepthMm", units);
  const apOverride = optionalBounded(overrides.axialDepthMm, "overrides.axialDepthMm", MAX.lengthMm);
  if (flute !== undefined && apOverride !== undefined && apOverride > flute * (1 + 1e-9)) {
    throw new MachiningInputError(
      "overrides.axialDepthMm",
      `overrides.axialDepthMm (${say(units, apOverride, "length")}) is deeper than the flute length (${say(units, flute, "length")}): the shank would rub.`,
    );
  }
  optionalBounded(overrides.stickoutMm, "overrides.stickoutMm", MAX.lengthMm);
  const stickout = overrides.stickoutMm ?? op.stickoutMm;
  if (stickout !== undefined && stickout > MAX_STICKOUT_DIAMETERS * d) {
    const field = overrides.stickoutMm === undefined ? "operation.stickoutMm" : "overrides.stickoutMm";
    throw new MachiningInputError(
      field,
      `${field} (${say(units, stickout, "length")}) is more than ${MAX_STICKOUT_DIAMETERS} times the cutter diameter; no cutting data holds at that stick-out.`,
    );
  }
}
