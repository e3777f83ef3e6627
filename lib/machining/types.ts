import type { RuleId } from "./adapt/rules-meta";
import type { WarningCode } from "./adapt/warning-codes";
import type { OperationKind } from "./operation-kinds";
import type { QuantityKind, UnitSystem } from "./quantities";

export { isOperationKind, LEGACY_OPERATION_KINDS, normalizeOperationKind, OPERATION_KINDS, type OperationKind } from "./operation-kinds";

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
  /** Corner radius; a radius of D/2 (within 1e-6·D) is a ball nose whatever `cornerForm` says. */
  cornerRadiusMm?: number;
  stickoutMm?: number;
  /** Length of cut; ap above it is refused and the stick-out is never taken shorter. */
  fluteLengthMm?: number;
  /** Default "square"; "ball" makes the cutter a ball nose (De at shallow depth). */
  cornerForm?: CornerForm;
  /** How the sheet enters the material (default: a straight plunge where a plunge feed is given). */
  entry?: EntryKind;
  rampAngleDeg?: number;
}

export const CORNER_FORMS = ["square", "ball", "corner-radius"] as const;
export type CornerForm = (typeof CORNER_FORMS)[number];

export const ENTRY_KINDS = ["plunge", "ramp", "helix"] as const;
export type EntryKind = (typeof ENTRY_KINDS)[number];

/** What the customer's CAM can do to enter the material. */
export const ENTRY_CAPABILITIES = ["plunge-only", "ramp", "helix"] as const;
export type EntryCapability = (typeof ENTRY_CAPABILITIES)[number];

export const SPINDLE_KINDS = ["constant-torque", "constant-power"] as const;
export type SpindleKind = (typeof SPINDLE_KINDS)[number];

export const RIGIDITY_CLASS_KEYS = ["light", "medium", "rigid"] as const;
export type RigidityClass = (typeof RIGIDITY_CLASS_KEYS)[number];

/** Chip load band per tooth as fractions of D (0.012 = 1.2 % of D). */
export interface ChipLoadPctOfD {
  min: number;
  max: number;
}

export interface MaterialInput {
  cuttingSpeedWindowMpm?: readonly [number, number];
  /** Absolute floor of the chip load band: fzMin = max(minChipLoadMm, min·D). */
  minChipLoadMm?: number;
  /** Constant kc, used at every chip thickness when kc11Nmm2 is absent. */
  specificCuttingForceNmm2?: number;
  chipLoadPctOfD?: ChipLoadPctOfD;
  /** Kienzle kc1.1 (N/mm² at h = 1 mm); with `mc`, kc(h) = kc1.1·h^(−mc). */
  kc11Nmm2?: number;
  /** Kienzle exponent mc (default 0.25 when only kc11Nmm2 is given). */
  mc?: number;
  /** Plastics that melt and weld the chip when the edge rubs (shallow passes on a straight plunge). */
  meltsWhenRubbing?: boolean;
}

/** Rigidity is a class on a 0–1 scale (1 = the stiffest machine the vendor rates). */
export interface ReferenceMachineInput {
  rigidity: number;
  rigidityClass?: RigidityClass;
  zThrustN?: number;
  maxFeedMmMin?: number;
  maxRpm?: number;
}

export interface MachineInput {
  minRpm: number;
  maxRpm: number;
  maxFeedMmMin: number;
  spindlePowerKw: number;
  rigidity: number;
  /** Unknown Z thrust defaults by rigidity class (defaultZThrustN). */
  zThrustN?: number;
  /** Speed up to which a constant-torque spindle holds torque (default maxRpm). */
  ratedRpm?: number;
  /** Default "constant-torque" (a VFD-driven spindle: P(n) = P·min(1, n/n_rated)). */
  spindleKind?: SpindleKind;
  /** Default: derived from `rigidity` (rigidityClassFromFactor). */
  rigidityClass?: RigidityClass;
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
  /** fz multiplier when a non-slot operation goes to full width (default 0.75). */
  slottingFactor?: number;
  /** Radial to tangential force ratio Kr (default 0.3). */
  radialForceRatio?: number;
  /** Unit system of warning and error messages (default metric). */
  messageUnits?: UnitSystem;
}

export interface AdaptInput {
  operation: OperationInput;
  material: MaterialInput;
  referenceMachine: ReferenceMachineInput;
  machine: MachineInput;
  overrides?: OverridesInput;
  options?: AdaptOptions;
  /** The customer's CAM entry capability (default "ramp": the sheet's depth is kept). */
  entryCapability?: EntryCapability;
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
  /** The input the warning is about, e.g. "operation.stickoutMm" (sanity warnings). */
  field?: string;
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
  /** hm, the mean chip thickness over the arc of engagement. */
  meanChipThicknessMm: number;
  /** De: the diameter that cuts (a ball nose at shallow depth cuts at less than D). */
  effectiveDiameterMm: number;
  /** Peak force on the cutter, F_peak = Ft,max·ze·√(1 + Kr²); null without cutting force data. */
  peakForceN: number | null;
  /** Spindle power available at the adapted speed, P(n) (before the usable fraction). */
  availablePowerKw: number | null;
  /** Estimated thrust of the plunge; null without a plunge feed or cutting force data. */
  plungeThrustN: number | null;
  /** fn of the adapted plunge; null without a plunge feed. */
  plungeFeedPerRevMm: number | null;
}

export interface AdaptResult extends AdaptNumbers {
  warnings: AdaptWarning[];
  steps: AdaptStep[];
}
