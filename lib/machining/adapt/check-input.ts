import { MachiningInputError } from "../errors";
import type { AdaptInput } from "../types";
import { OPERATION_KINDS } from "../types";
import { bounded, count, fraction, ordered, radialDepth } from "../validate";

// Generous ceilings: far beyond any cutter or machine, low enough that no product overflows.
export const MAX = { lengthMm: 10_000, rpm: 1_000_000, feedMmMin: 10_000_000, kcNmm2: 100_000, powerKw: 10_000, forceN: 10_000_000, mpm: 100_000 };

const KINDS = new Set<string>(OPERATION_KINDS);

const optionalBounded = (value: number | undefined, field: string, max: number) =>
  value === undefined ? undefined : bounded(value, field, max);

const section = (value: unknown, field: string) => {
  if (typeof value !== "object" || value === null) throw new MachiningInputError(field, `${field} is required.`);
};

/** Checks operation, material and machines; throws MachiningInputError naming the field. */
export function checkInput({ operation: op, material, referenceMachine, machine, overrides = {} }: AdaptInput): void {
  section(op, "operation");
  section(material, "material");
  section(referenceMachine, "referenceMachine");
  section(machine, "machine");
  if (!KINDS.has(op.kind)) throw new MachiningInputError("operation.kind", `operation.kind must be one of ${OPERATION_KINDS.join(", ")}.`);
  const d = bounded(op.diameterMm, "operation.diameterMm", MAX.lengthMm);
  count(op.flutes, "operation.flutes");
  bounded(op.flutes, "operation.flutes", 1000);
  bounded(op.rpm, "operation.rpm", MAX.rpm);
  bounded(op.feedMmMin, "operation.feedMmMin", MAX.feedMmMin);
  bounded(op.axialDepthMm, "operation.axialDepthMm", MAX.lengthMm);
  radialDepth(op.radialDepthMm, d, "operation.radialDepthMm");
  optionalBounded(op.plungeFeedMmMin, "operation.plungeFeedMmMin", MAX.feedMmMin);
  optionalBounded(op.stickoutMm, "operation.stickoutMm", MAX.lengthMm);
  if (op.cornerRadiusMm !== undefined && !(op.cornerRadiusMm >= 0 && op.cornerRadiusMm <= d / 2)) {
    throw new MachiningInputError("operation.cornerRadiusMm", "operation.cornerRadiusMm must be between 0 and half the diameter.");
  }
  const window = material.cuttingSpeedWindowMpm;
  if (window !== undefined) {
    bounded(window[0], "material.cuttingSpeedWindowMpm.0", MAX.mpm);
    bounded(window[1], "material.cuttingSpeedWindowMpm.1", MAX.mpm);
    ordered(window[0], window[1], "material.cuttingSpeedWindowMpm.0", "material.cuttingSpeedWindowMpm.1");
  }
  optionalBounded(material.minChipLoadMm, "material.minChipLoadMm", MAX.lengthMm);
  optionalBounded(material.specificCuttingForceNmm2, "material.specificCuttingForceNmm2", MAX.kcNmm2);
  fraction(referenceMachine.rigidity, "referenceMachine.rigidity");
  bounded(machine.minRpm, "machine.minRpm", MAX.rpm);
  bounded(machine.maxRpm, "machine.maxRpm", MAX.rpm);
  ordered(machine.minRpm, machine.maxRpm, "machine.minRpm", "machine.maxRpm");
  bounded(machine.maxFeedMmMin, "machine.maxFeedMmMin", MAX.feedMmMin);
  bounded(machine.spindlePowerKw, "machine.spindlePowerKw", MAX.powerKw);
  fraction(machine.rigidity, "machine.rigidity");
  optionalBounded(machine.zThrustN, "machine.zThrustN", MAX.forceN);
  if (overrides.radialDepthMm !== undefined) radialDepth(overrides.radialDepthMm, d, "overrides.radialDepthMm");
  optionalBounded(overrides.axialDepthMm, "overrides.axialDepthMm", MAX.lengthMm);
  optionalBounded(overrides.stickoutMm, "overrides.stickoutMm", MAX.lengthMm);
}
