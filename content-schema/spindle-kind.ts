import { z } from "zod";

import { SPINDLE_KIND_KEYS } from "./spindle-kind-labels";

export { SPINDLE_KIND_KEYS, spindleKindLabels, type SpindleKindKey } from "./spindle-kind-labels";

const blankToUndefined = (value: unknown) => (typeof value === "string" && value.trim() === "" ? undefined : value);

export const spindleKindSchema = z.preprocess(
  blankToUndefined,
  z.enum(SPINDLE_KIND_KEYS, { error: "Choose how the spindle delivers power." }).default("constant-torque"),
);
