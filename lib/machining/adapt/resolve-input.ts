import { MachiningInputError } from "../errors";
import { chipLoadBand, type ChipLoadBand } from "../formulas/chip-band";
import { DEFAULT_KIENZLE_MC } from "../formulas/force";
import { defaultZThrustN, rigidityClassFromFactor } from "../formulas/rigidity";
import { OPERATION_KINDS, toOperationKind, type OperationKind } from "../operation-kinds";
import type { UnitSystem } from "../quantities";
import type { AdaptInput, EntryCapability, MachineInput, OperationInput, OverridesInput, RigidityClass, SpindleKind } from "../types";
import { bounded, fraction, nonNegative } from "../validate";
import { checkInput, MAX } from "./check-input";
import { passesInputChecks } from "./check-input-fast";
import { ADAPT_DEFAULTS, BALL_NOSE_TOLERANCE, YOUNGS_MODULUS_GPA } from "./defaults";

/** kc(h) = kc11·h^(−mc); a constant kc is kc11 with mc = 0. */
export interface ResolvedForce {
  kc11Nmm2: number;
  mc: number;
}

/** The caller's sections as given (never copied: this runs on every call), plus what was derived or defaulted. */
export interface ResolvedInput {
  operation: OperationInput;
  kind: OperationKind;
  /** Corner form "ball", or a corner radius of D/2. */
  ballNose: boolean;
  material: AdaptInput["material"];
  band: ChipLoadBand;
  force: ResolvedForce | null;
  meltsWhenRubbing: boolean;
  referenceRigidity: number;
  machine: MachineInput;
  /** Speed up to which a constant-torque spindle holds torque (default: the top speed). */
  ratedRpm: number;
  spindleKind: SpindleKind;
  rigidityClass: RigidityClass;
  zThrustN: number;
  /** The Z thrust is the rigidity class's default, not the machine's own. */
  zThrustAssumed: boolean;
  overrides: OverridesInput;
  entryCapability: EntryCapability;
  stickoutMm?: number;
  usablePowerFraction: number;
  deflectionLimitMm: number;
  spindleEfficiency: number;
  youngsModulusGPa: number;
  rampThresholdDiameterMm: number;
  slottingFactor: number;
  radialForceRatio: number;
  units: UnitSystem;
}

function forceModel(material: AdaptInput["material"]): ResolvedForce | null {
  if (material.kc11Nmm2 !== undefined) return { kc11Nmm2: material.kc11Nmm2, mc: material.mc ?? DEFAULT_KIENZLE_MC };
  if (material.specificCuttingForceNmm2 !== undefined) return { kc11Nmm2: material.specificCuttingForceNmm2, mc: 0 };
  return null;
}

/** Checks every input and fills defaults; throws MachiningInputError naming the field. */
export function resolveInput(input: AdaptInput): ResolvedInput {
  const { operation: op, material, referenceMachine, machine, overrides = {}, options = {} } = input;
  const units: UnitSystem = options.messageUnits === "imperial" ? "imperial" : "metric";
  if (!passesInputChecks(input)) checkInput(input, units);
  const toolMaterial = options.toolMaterial ?? ADAPT_DEFAULTS.toolMaterial;
  if (!Object.hasOwn(YOUNGS_MODULUS_GPA, toolMaterial)) throw new MachiningInputError("options.toolMaterial", "options.toolMaterial must be carbide or hss.");
  const kind = toOperationKind(op.kind);
  if (kind === undefined) throw new MachiningInputError("operation.kind", `operation.kind must be one of ${OPERATION_KINDS.join(", ")}.`);
  const radialForceRatio = nonNegative(options.radialForceRatio ?? ADAPT_DEFAULTS.radialForceRatio, "options.radialForceRatio");
  if (radialForceRatio > 10) throw new MachiningInputError("options.radialForceRatio", "options.radialForceRatio must be at most 10.");
  const d = op.diameterMm;
  const rigidityClass = machine.rigidityClass ?? rigidityClassFromFactor(machine.rigidity);
  return {
    operation: op,
    kind,
    ballNose: op.cornerForm === "ball" || (op.cornerRadiusMm !== undefined && op.cornerRadiusMm >= d / 2 - BALL_NOSE_TOLERANCE * d),
    material,
    band: chipLoadBand(material, d),
    force: forceModel(material),
    meltsWhenRubbing: material.meltsWhenRubbing === true,
    referenceRigidity: referenceMachine.rigidity,
    machine,
    ratedRpm: machine.ratedRpm ?? machine.maxRpm,
    spindleKind: machine.spindleKind ?? "constant-torque",
    rigidityClass,
    zThrustN: machine.zThrustN ?? defaultZThrustN(rigidityClass),
    zThrustAssumed: machine.zThrustN === undefined,
    overrides,
    entryCapability: input.entryCapability ?? ADAPT_DEFAULTS.entryCapability,
    stickoutMm: overrides.stickoutMm ?? op.stickoutMm,
    usablePowerFraction: fraction(options.usablePowerFraction ?? ADAPT_DEFAULTS.usablePowerFraction, "options.usablePowerFraction"),
    deflectionLimitMm: bounded(options.deflectionLimitMm ?? ADAPT_DEFAULTS.deflectionLimitMm, "options.deflectionLimitMm", MAX.lengthMm),
    spindleEfficiency: fraction(options.spindleEfficiency ?? ADAPT_DEFAULTS.spindleEfficiency, "options.spindleEfficiency"),
    youngsModulusGPa: bounded(options.youngsModulusGPa ?? YOUNGS_MODULUS_GPA[toolMaterial], "options.youngsModulusGPa", 10_000),
    rampThresholdDiameterMm: bounded(options.rampThresholdDiameterMm ?? ADAPT_DEFAULTS.rampThresholdDiameterMm, "options.rampThresholdDiameterMm", MAX.lengthMm),
    slottingFactor: fraction(options.slottingFactor ?? ADAPT_DEFAULTS.slottingFactor, "options.slottingFactor"),
    radialForceRatio,
    units,
  };
}
