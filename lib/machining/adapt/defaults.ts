import type { ToolMaterial } from "../types";

/** Young's modulus by tool material in GPa: approximate values from memory. */
export const YOUNGS_MODULUS_GPA: Record<ToolMaterial, number> = { carbide: 600, hss: 210 };

export const ADAPT_DEFAULTS = {
  usablePowerFraction: 0.8,
  deflectionLimitMm: 0.025,
  spindleEfficiency: 1,
  toolMaterial: "carbide" as ToolMaterial,
  rampThresholdDiameterMm: 10,
  slottingFactor: 0.75,
  radialForceRatio: 0.3,
  messageUnits: "metric" as "metric" | "imperial",
  entryCapability: "ramp" as "plunge-only" | "ramp" | "helix",
} as const;

/** fz multiplier on going to full width from a sheet operation that is not a slot (common practice: 70–80 %). */
export const SLOTTING_FACTOR = ADAPT_DEFAULTS.slottingFactor;
/** From this share of D on, a radial override counts as full width. */
export const FULL_WIDTH_SHARE = 0.9;
/** ap cap, as a share of the sheet's, on going to full width. */
export const SLOT_DEPTH_SHARE = 0.7;
/** Straight plunge only in a material that melts: ap per pass at most this share of D. */
export const PLUNGE_ONLY_DEPTH_SHARE = 0.25;
/** Stick-out above this many diameters is refused. */
export const MAX_STICKOUT_DIAMETERS = 20;
/** Cutter diameters the engine adapts, in mm. */
export const DIAMETER_RANGE_MM = [0.1, 100] as const;
/** A corner radius this close to D/2 (as a share of D) makes a ball nose. */
export const BALL_NOSE_TOLERANCE = 1e-6;

/** A radial override below this share of D is refused: chip thinning is not extrapolated. */
export const MIN_RADIAL_ENGAGEMENT = 0.05;
/** Below this share of the sheet's ap, the machine is called too small. */
export const MIN_AXIAL_DEPTH_SHARE = 0.1;
