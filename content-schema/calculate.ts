import { z } from "zod";

import { operationKindSchema } from "./sheet-kinds";

// Body of POST /api/v1/calculate. Every length, feed, speed, power and force names its unit,
// so a caller can mix systems (a metric cutter on an imperial machine) without guessing.

const amount = z.number().positive();
const quantity = <U extends readonly [string, ...string[]]>(units: U) => z.strictObject({ value: amount, unit: z.enum(units) });

export const LENGTH_UNITS = ["mm", "in"] as const;
export const FEED_UNITS = ["mm/min", "m/min", "in/min"] as const;
export const CUTTING_SPEED_UNITS = ["m/min", "SFM"] as const;
export const CHIP_LOAD_UNITS = ["mm/tooth", "in/tooth"] as const;
export const POWER_UNITS = ["kW", "W", "hp"] as const;
export const FORCE_UNITS = ["N", "lbf"] as const;
export const SPECIFIC_FORCE_UNITS = ["N/mm²", "N/mm2", "MPa", "psi"] as const;

export const lengthSchema = quantity(LENGTH_UNITS);
export const feedSchema = quantity(FEED_UNITS);
const rpmSchema = quantity(["rpm"] as const);
const rigidityClassSchema = z.enum(["light", "medium", "rigid"]);
const rigiditySchema = z.number().gt(0).lte(1);
const fractionSchema = z.number().gt(0).lte(1);

export const calculateBodySchema = z.strictObject({
  /** The system the caller reads first; the result always carries both. */
  units: z.enum(["metric", "imperial"]),
  operation: z.strictObject({
    kind: operationKindSchema,
    diameter: lengthSchema,
    flutes: z.int().min(1).max(64),
    spindleSpeed: rpmSchema,
    feed: feedSchema,
    axialDepth: lengthSchema,
    radialDepth: lengthSchema,
    plungeFeed: feedSchema.optional(),
    cornerRadius: z.strictObject({ value: z.number().min(0), unit: z.enum(LENGTH_UNITS) }).optional(),
    /** "ball" makes a ball nose (so does a corner radius of half the diameter). */
    cornerForm: z.enum(["square", "ball", "corner-radius"]).optional(),
    stickout: lengthSchema.optional(),
    fluteLength: lengthSchema.optional(),
    entry: z.enum(["plunge", "ramp", "helix"]).optional(),
    rampAngle: z.strictObject({ value: z.number().gt(0).max(45), unit: z.literal("deg") }).optional(),
  }),
  material: z
    .strictObject({
      cuttingSpeedWindow: z.strictObject({ min: amount, max: amount, unit: z.enum(CUTTING_SPEED_UNITS) }).optional(),
      minChipLoad: quantity(CHIP_LOAD_UNITS).optional(),
      specificCuttingForce: quantity(SPECIFIC_FORCE_UNITS).optional(),
      /** Chip load band per tooth as a percentage of the cutter diameter, e.g. 1.2 to 3 % of D. */
      chipLoadBand: z.strictObject({ min: amount.max(100), max: amount.max(100), unit: z.literal("% of D") }).optional(),
      /** Kienzle kc1.1 (at h = 1 mm) and its exponent mc. */
      kc11: quantity(SPECIFIC_FORCE_UNITS).optional(),
      mc: z.number().min(0).lt(1).optional(),
      meltsWhenRubbing: z.boolean().optional(),
    })
    .default({}),
  referenceMachine: z.strictObject({
    rigidity: rigiditySchema,
    rigidityClass: rigidityClassSchema.optional(),
    zThrust: quantity(FORCE_UNITS).optional(),
    maxFeed: feedSchema.optional(),
    maxSpindleSpeed: rpmSchema.optional(),
  }),
  machine: z.strictObject({
    spindleSpeed: z.strictObject({ min: amount, max: amount, unit: z.literal("rpm") }),
    maxFeed: feedSchema,
    spindlePower: quantity(POWER_UNITS),
    rigidity: rigiditySchema,
    zThrust: quantity(FORCE_UNITS).optional(),
    /** Speed up to which a constant-torque spindle holds its torque; defaults to the top speed. */
    ratedSpindleSpeed: rpmSchema.optional(),
    spindleKind: z.enum(["constant-torque", "constant-power"]).optional(),
    rigidityClass: rigidityClassSchema.optional(),
  }),
  /** What the caller's CAM can do to enter the material. */
  entryCapability: z.enum(["plunge-only", "ramp", "helix"]).optional(),
  overrides: z.strictObject({ radialDepth: lengthSchema, axialDepth: lengthSchema, stickout: lengthSchema }).partial().optional(),
  options: z
    .strictObject({
      usablePowerFraction: fractionSchema,
      deflectionLimit: lengthSchema,
      spindleEfficiency: fractionSchema,
      toolMaterial: z.enum(["carbide", "hss"]),
      youngsModulus: quantity(["GPa"] as const),
      rampThresholdDiameter: lengthSchema,
      slottingFactor: fractionSchema,
      radialForceRatio: z.number().min(0).max(10),
    })
    .partial()
    .optional(),
});

export type CalculateBody = z.infer<typeof calculateBodySchema>;
export type LengthQuantity = z.infer<typeof lengthSchema>;
export type FeedQuantity = z.infer<typeof feedSchema>;
