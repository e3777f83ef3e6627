import { MachiningInputError } from "../errors";
import type { ChipLoadBand } from "../formulas/chip-band";
import { DEFAULT_KIENZLE_MC } from "../formulas/force";
import { defaultZThrustN, RIGIDITY_CLASS_BANDS } from "../formulas/rigidity";
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

// Shared when the caller gives none: rules only read them. The defaults are known to pass their checks,
// so only a value the caller gave is checked (the same check, the same message).
const NO_OVERRIDES: OverridesInput = Object.freeze({});
const NO_OPTIONS: NonNullable<AdaptInput["options"]> = Object.freeze({});

const rigidityClassOf = (rigidity: number): RigidityClass =>
  rigidity < RIGIDITY_CLASS_BANDS.lightBelow ? "light" : rigidity < RIGIDITY_CLASS_BANDS.mediumBelow ? "medium" : "rigid";

/** Checks every input and fills defaults; throws MachiningInputError naming the field. */
export function resolveInput(input: AdaptInput): ResolvedInput {
  const op = input.operation;
  const material = input.material;
  const machine = input.machine;
  // Only a missing section is defaulted (as destructuring defaults did); null still fails as before.
  const overrides = input.overrides === undefined ? NO_OVERRIDES : input.overrides;
  const options = input.options === undefined ? NO_OPTIONS : input.options;
  const units: UnitSystem = options.messageUnits === "imperial" ? "imperial" : "metric";
  if (!passesInputChecks(input)) checkInput(input, units);
  const toolMaterial = options.toolMaterial ?? ADAPT_DEFAULTS.toolMaterial;
  if (options.toolMaterial !== undefined && !Object.hasOwn(YOUNGS_MODULUS_GPA, toolMaterial)) {
    throw new MachiningInputError("options.toolMaterial", "options.toolMaterial must be carbide or hss.");
  }
  const kind = toOperationKind(op.kind);
  if (kind === undefined) throw new MachiningInputError("operation.kind", `operation.kind must be one of ${OPERATION_KINDS.join(", ")}.`);
  const radialForceRatio =
    options.radialForceRatio === undefined
      ? ADAPT_DEFAULTS.radialForceRatio
      : nonNegative(options.radialForceRatio, "options.radialForceRatio");
  if (radialForceRatio > 10) throw new MachiningInputError("options.radialForceRatio", "options.radialForceRatio must be at most 10.");
  const d = op.diameterMm;
  // The rigidity was checked above (a fraction), so the class follows from its bands directly.
  const rigidityClass = machine.rigidityClass ?? rigidityClassOf(machine.rigidity);
  const pct = material.chipLoadPctOfD;
  const bandMin = Math.max(material.minChipLoadMm ?? 0, pct ? pct.min * d : 0);
  const bandMax = pct ? pct.max * d : Number.POSITIVE_INFINITY;
  return {
    operation: op,
    kind,
    ballNose: op.cornerForm === "ball" || (op.cornerRadiusMm !== undefined && op.cornerRadiusMm >= d / 2 - BALL_NOSE_TOLERANCE * d),
    material,
    // chipLoadBand(material, d), written out: d is already checked.
    band: { minMm: bandMin, maxMm: bandMax, impossible: bandMax < bandMin },
    force: forceModel(material),
    meltsWhenRubbing: material.meltsWhenRubbing === true,
    referenceRigidity: input.referenceMachine.rigidity,
    machine,
    ratedRpm: machine.ratedRpm ?? machine.maxRpm,
    spindleKind: machine.spindleKind ?? "constant-torque",
    rigidityClass,
    zThrustN: machine.zThrustN ?? defaultZThrustN(rigidityClass),
    zThrustAssumed: machine.zThrustN === undefined,
    overrides,
    entryCapability: input.entryCapability ?? ADAPT_DEFAULTS.entryCapability,
    stickoutMm: overrides.stickoutMm ?? op.stickoutMm,
    usablePowerFraction:
      options.usablePowerFraction === undefined
        ? ADAPT_DEFAULTS.usablePowerFraction
        : fraction(options.usablePowerFraction, "options.usablePowerFraction"),
    deflectionLimitMm:
      options.deflectionLimitMm === undefined
        ? ADAPT_DEFAULTS.deflectionLimitMm
        : bounded(options.deflectionLimitMm, "options.deflectionLimitMm", MAX.lengthMm),
    spindleEfficiency:
      options.spindleEfficiency === undefined
        ? ADAPT_DEFAULTS.spindleEfficiency
        : fraction(options.spindleEfficiency, "options.spindleEfficiency"),
    youngsModulusGPa:
      options.youngsModulusGPa === undefined
        ? YOUNGS_MODULUS_GPA[toolMaterial]
        : bounded(options.youngsModulusGPa, "options.youngsModulusGPa", 10_000),
    rampThresholdDiameterMm:
      options.rampThresholdDiameterMm === undefined
        ? ADAPT_DEFAULTS.rampThresholdDiameterMm
        : bounded(options.rampThresholdDiameterMm, "options.rampThresholdDiameterMm", MAX.lengthMm),
    slottingFactor:
      options.slottingFactor === undefined ? ADAPT_DEFAULTS.slottingFactor : fraction(options.slottingFactor, "options.slottingFactor"),
    radialForceRatio,
    units,
  };
}
