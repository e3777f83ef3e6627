import { rigidityFactor, type RigidityKey } from "@/content-schema/machine-rigidity";
import type { SpindleKindKey } from "@/content-schema/spindle-kind";
import {
  hpToKw,
  isMachiningInputError,
  lbfToN,
  parseFeed,
  parseLength,
  parseSpindleSpeed,
  type AdaptResult,
  type EntryCapability,
  type UnitSystem,
} from "@/lib/machining";

import { adaptOperation, type AdaptContext, type BenchMachineInput } from "./adapt-context";

// Pure: what the adapt panel computes on every keystroke. Never returns NaN: bad input becomes a message.

/** A machine typed into the panel without signing in; numbers as typed. */
export type AdhocMachineDraft = {
  rpmMin: string;
  rpmMax: string;
  power: string;
  maxFeed: string;
  rigidity: RigidityKey;
  zThrust: string;
  stickout: string;
  spindleKind: SpindleKindKey;
  ratedRpm: string;
};
export type OverrideDraft = { ae: string; ap: string; stickout: string };

export type Adaptation =
  | { ok: true; result: AdaptResult; overridesMm: { radialDepthMm?: number; axialDepthMm?: number; stickoutMm?: number } }
  | { ok: false; errors: Record<string, string> };

type Parse = (text: string) => number;

function read(
  errors: Record<string, string>,
  field: string,
  text: string,
  parse: Parse,
  what: string,
  optional = false,
): number | undefined {
  const trimmed = text.trim();
  if (!trimmed) {
    if (!optional) errors[field] = `Enter ${what}.`;
    return undefined;
  }
  try {
    const value = parse(trimmed);
    if (!(value > 0) || !Number.isFinite(value)) {
      errors[field] = `${what[0].toUpperCase()}${what.slice(1)} must be more than zero.`;
      return undefined;
    }
    return value;
  } catch (error) {
    if (!isMachiningInputError(error)) throw error;
    errors[field] = error.message;
    return undefined;
  }
}

const plainNumber: Parse = (text) => {
  const value = Number(text.replace(",", "."));
  if (!Number.isFinite(value)) throw new RangeError(text);
  return value;
};
const guard =
  (parse: Parse): Parse =>
  (text) => {
    try {
      return parse(text);
    } catch (error) {
      if (error instanceof RangeError) return Number.NaN;
      throw error;
    }
  };

export function readAdhocMachine(draft: AdhocMachineDraft, units: UnitSystem, errors: Record<string, string>): BenchMachineInput | null {
  const lengthUnit = units === "imperial" ? "in" : "mm";
  const minRpm = read(errors, "rpmMin", draft.rpmMin, (t) => parseSpindleSpeed(t), "the lowest spindle speed");
  const maxRpm = read(errors, "rpmMax", draft.rpmMax, (t) => parseSpindleSpeed(t), "the highest spindle speed");
  const power = read(errors, "power", draft.power, guard(plainNumber), `the spindle power in ${units === "imperial" ? "hp" : "kW"}`);
  const maxFeed = read(
    errors,
    "maxFeed",
    draft.maxFeed,
    (t) => parseFeed(t, { defaultUnit: units === "imperial" ? "in/min" : "mm/min" }),
    "the highest feed",
  );
  const zThrust = read(errors, "zThrust", draft.zThrust, guard(plainNumber), "the Z thrust", true);
  const ratedRpm = read(errors, "ratedRpm", draft.ratedRpm, (t) => parseSpindleSpeed(t), "the rated speed", true);
  const stickout = read(
    errors,
    "machineStickout",
    draft.stickout,
    (t) => parseLength(t, { defaultUnit: lengthUnit }),
    "the stick-out",
    true,
  );
  if (minRpm !== undefined && maxRpm !== undefined && minRpm > maxRpm) errors.rpmMin = "The lowest spindle speed is above the highest.";
  if (ratedRpm !== undefined && maxRpm !== undefined && ratedRpm > maxRpm)
    errors.ratedRpm = "The rated speed is above the highest spindle speed.";
  if (minRpm === undefined || maxRpm === undefined || power === undefined || maxFeed === undefined || Object.keys(errors).length)
    return null;
  return {
    minRpm,
    maxRpm,
    spindlePowerKw: units === "imperial" ? hpToKw(power) : power,
    maxFeedMmMin: maxFeed,
    rigidity: rigidityFactor(draft.rigidity),
    zThrustN: zThrust === undefined ? undefined : units === "imperial" ? lbfToN(zThrust) : zThrust,
    spindleKind: draft.spindleKind,
    ratedRpm,
    stickoutMm: stickout,
  };
}

/** Parses the overrides, adapts the operation, and turns any engine refusal into a message on its field. */
export function computeAdaptation(options: {
  context: AdaptContext;
  operationIndex: number;
  machine: BenchMachineInput | null;
  overrides: OverrideDraft;
  units: UnitSystem;
  entryCapability?: EntryCapability;
  errors?: Record<string, string>;
}): Adaptation {
  const errors = { ...options.errors };
  const defaultUnit = options.units === "imperial" ? "in" : "mm";
  const length = (t: string) => parseLength(t, { defaultUnit });
  const overridesMm = {
    radialDepthMm: read(errors, "ae", options.overrides.ae, length, "ae", true),
    axialDepthMm: read(errors, "ap", options.overrides.ap, length, "ap", true),
    stickoutMm: read(errors, "stickout", options.overrides.stickout, length, "the stick-out", true),
  };
  if (!options.machine && !Object.keys(errors).length) errors.machine = "Choose a machine or type one in.";
  if (!options.machine || Object.keys(errors).length) return { ok: false, errors };
  try {
    return {
      ok: true,
      result: adaptOperation(options.context, options.operationIndex, options.machine, overridesMm, {
        entryCapability: options.entryCapability,
        units: options.units,
      }),
      overridesMm,
    };
  } catch (error) {
    if (!isMachiningInputError(error)) throw error;
    const field = error.field.includes("radial")
      ? "ae"
      : error.field.includes("axial")
        ? "ap"
        : error.field.includes("stickout")
          ? "stickout"
          : "machine";
    return { ok: false, errors: { [field]: error.message } };
  }
}
