import { MachiningInputError } from "../errors";
import type { AdaptInput, MaterialInput, OperationInput, OverridesInput } from "../types";
import { bounded, fraction } from "../validate";
import { checkInput, MAX } from "./check-input";
import { ADAPT_DEFAULTS, YOUNGS_MODULUS_GPA } from "./defaults";

export interface ResolvedInput {
  operation: Required<Pick<OperationInput, "kind" | "diameterMm" | "flutes" | "rpm" | "feedMmMin" | "axialDepthMm" | "radialDepthMm">> & { plungeFeedMmMin?: number };
  material: MaterialInput;
  referenceRigidity: number;
  machine: AdaptInput["machine"];
  overrides: OverridesInput;
  stickoutMm?: number;
  usablePowerFraction: number;
  deflectionLimitMm: number;
  spindleEfficiency: number;
  youngsModulusGPa: number;
  rampThresholdDiameterMm: number;
}

/** Checks every input and fills option defaults; throws MachiningInputError naming the field. */
export function resolveInput(input: AdaptInput): ResolvedInput {
  checkInput(input);
  const { operation: op, material, referenceMachine, machine, overrides = {}, options = {} } = input;
  const toolMaterial = options.toolMaterial ?? ADAPT_DEFAULTS.toolMaterial;
  if (!Object.hasOwn(YOUNGS_MODULUS_GPA, toolMaterial)) throw new MachiningInputError("options.toolMaterial", "options.toolMaterial must be carbide or hss.");
  return {
    operation: op,
    material,
    referenceRigidity: referenceMachine.rigidity,
    machine,
    overrides,
    stickoutMm: overrides.stickoutMm ?? op.stickoutMm,
    usablePowerFraction: fraction(options.usablePowerFraction ?? ADAPT_DEFAULTS.usablePowerFraction, "options.usablePowerFraction"),
    deflectionLimitMm: bounded(options.deflectionLimitMm ?? ADAPT_DEFAULTS.deflectionLimitMm, "options.deflectionLimitMm", MAX.lengthMm),
    spindleEfficiency: fraction(options.spindleEfficiency ?? ADAPT_DEFAULTS.spindleEfficiency, "options.spindleEfficiency"),
    youngsModulusGPa: bounded(options.youngsModulusGPa ?? YOUNGS_MODULUS_GPA[toolMaterial], "options.youngsModulusGPa", 10_000),
    rampThresholdDiameterMm: bounded(options.rampThresholdDiameterMm ?? ADAPT_DEFAULTS.rampThresholdDiameterMm, "options.rampThresholdDiameterMm", MAX.lengthMm),
  };
}
