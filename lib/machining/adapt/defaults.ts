import type { ToolMaterial } from "../types";

/** Young's modulus by tool material in GPa: approximate values from memory. */
export const YOUNGS_MODULUS_GPA: Record<ToolMaterial, number> = { carbide: 600, hss: 210 };

export const ADAPT_DEFAULTS = {
  usablePowerFraction: 0.8,
  deflectionLimitMm: 0.025,
  spindleEfficiency: 1,
  toolMaterial: "carbide" as ToolMaterial,
  rampThresholdDiameterMm: 10,
} as const;

/** A radial override below this share of D is refused: chip thinning is not extrapolated. */
export const MIN_RADIAL_ENGAGEMENT = 0.05;
/** Below this share of the sheet's ap, the machine is called too small. */
export const MIN_AXIAL_DEPTH_SHARE = 0.1;
