import type { QuantityKind } from "./quantities";
import type { RuleId } from "./adapt/rules-meta";
import type { WarningCode } from "./adapt/warning-codes";

/** Operation kinds, the same keys as content-schema/sheet-kinds.ts (the engine imports no zod). */
export const OPERATION_KINDS = ["slotting", "pocket", "adaptive", "profile", "finishing", "plunge", "ramp", "helical", "drilling"] as const;
export type OperationKind = (typeof OPERATION_KINDS)[number];

export const TOOL_MATERIALS = ["carbide", "hss"] as const;
export type ToolMaterial = (typeof TOOL_MATERIALS)[number];

/** One operation of a sheet version, as tested on the reference machine. */
export interface OperationInput {
  kind: OperationKind;
  diameterMm: number;
  flutes: number;
  rpm: number;
  feedMmMin: number;
  axialDepthMm: number;
  radialDepthMm: number;
  plungeFeedMmMin?: number;
  cornerRadiusMm?: number;
  stickoutMm?: number;
}

export interface MaterialInput {
  cuttingSpeedWindowMpm?: readonly [number, number];
  minChipLoadMm?: number;
  specificCuttingForceNmm2?: number;
}

/** Rigidity is a class on a 0–1 scale (1 = the stiffest machine the vendor rates). */
export interface ReferenceMachineInput {
  rigidity: number;
}

export interface MachineInput {
  minRpm: number;
  maxRpm: number;
  maxFeedMmMin: number;
  spindlePowerKw: number;
  rigidity: number;
  zThrustN?: number;
}

export interface OverridesInput {
  radialDepthMm?: number;
  axialDepthMm?: number;
  stickoutMm?: number;
}

export interface AdaptOptions {
  /** Share of rated spindle power the cut may use (default 0.8). */
  usablePowerFraction?: number;
  /** Largest acceptable tool tip deflection in mm (default 0.025). */
  deflectionLimitMm?: number;
  /** Spindle and drive efficiency η (default 1: the usable fraction already leaves the margin). */
  spindleEfficiency?: number;
  /** Tool material for Young's modulus (default carbide). */
  toolMaterial?: ToolMaterial;
  /** Overrides the modulus table, in GPa. */
  youngsModulusGPa?: number;
  /** From this cutter diameter on, a ramp or helical entry is recommended (default 10 mm). */
  rampThresholdDiameterMm?: number;
}

export interface AdaptInput {
  operation: OperationInput;
  material: MaterialInput;
  referenceMachine: ReferenceMachineInput;
  machine: MachineInput;
  overrides?: OverridesInput;
  options?: AdaptOptions;
}

/** A number a rule changed, with the reason in plain words and the source of the rule. */
export interface AdaptStep {
  rule: RuleId;
  quantity: QuantityKind;
  /** Which output the step changed, e.g. "rpm" or "feedMmMin". */
  field: keyof AdaptNumbers;
  before: number;
  after: number;
  why: string;
  source: string;
}

/** A number attached to a warning (a suggestion or the value that tripped it), in metric units. */
export interface WarningValue {
  name: string;
  quantity: QuantityKind;
  value: number;
}

export interface AdaptWarning {
  code: WarningCode;
  message: string;
  values?: WarningValue[];
}

export interface AdaptNumbers {
  rpm: number;
  feedMmMin: number;
  chipLoadMm: number;
  maxChipThicknessMm: number;
  cuttingSpeedMpm: number;
  axialDepthMm: number;
  radialDepthMm: number;
  /** null when the sheet gives no plunge feed. */
  plungeFeedMmMin: number | null;
  mrrCm3Min: number;
  /** null when the material has no specific cutting force. */
  powerKw: number | null;
  torqueNm: number | null;
  forceN: number | null;
  /** null without a specific cutting force or a stick-out. */
  deflectionMm: number | null;
}

export interface AdaptResult extends AdaptNumbers {
  warnings: AdaptWarning[];
  steps: AdaptStep[];
}
