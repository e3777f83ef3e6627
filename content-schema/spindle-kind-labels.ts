// The spindle kinds and their labels without the schema: browser code (the adapt panel's machine picker)
// imports these, and importing zod there would put all of zod in the panel's download.

export const SPINDLE_KIND_KEYS = ["constant-torque", "constant-power"] as const;
export type SpindleKindKey = (typeof SPINDLE_KIND_KEYS)[number];

/** In the trade's words: most router spindles run on a VFD and hold torque, not power, below their rated speed. */
export const spindleKindLabels: Record<SpindleKindKey, string> = {
  "constant-torque": "VFD spindle (constant torque below its rated speed)",
  "constant-power": "Constant power over its speed range",
};
