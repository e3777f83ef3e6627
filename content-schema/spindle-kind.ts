import { z } from "zod";

export const SPINDLE_KIND_KEYS = ["constant-torque", "constant-power"] as const;
export type SpindleKindKey = (typeof SPINDLE_KIND_KEYS)[number];

/** In the trade's words: most router spindles run on a VFD and hold torque, not power, below their rated speed. */
export const spindleKindLabels: Record<SpindleKindKey, string> = {
  "constant-torque": "VFD spindle (constant torque below its rated speed)",
  "constant-power": "Constant power over its speed range",
};

const blankToUndefined = (value: unknown) => (typeof value === "string" && value.trim() === "" ? undefined : value);

export const spindleKindSchema = z.preprocess(
  blankToUndefined,
  z.enum(SPINDLE_KIND_KEYS, { error: "Choose how the spindle delivers power." }).default("constant-torque"),
);
