import { z } from "zod";

import { feedSchema, lengthSchema, radialDepthSchema, spindleSpeedSchema } from "./quantity";
import { entryMethodSchema, operationKindSchema } from "./sheet-kinds";

const ENTRY_WITH_ANGLE = new Set(["ramp", "helical"]);

/** One block of cutting data: what the cut is, and the numbers to run it with. */
export const sheetOperationSchema = z
  .strictObject({
    kind: operationKindSchema,
    label: z.string().trim().min(1).max(80).optional(),
    n: spindleSpeedSchema.describe("Spindle speed n, e.g. 18000 rpm"),
    vf: feedSchema.describe("Feed rate vf, e.g. 1800 mm/min or 70 in/min"),
    ap: lengthSchema.describe("Axial depth of cut ap, e.g. 3 mm or 1/8 in"),
    ae: radialDepthSchema.describe("Radial depth of cut ae (stepover), a length or a percentage of the cutter diameter, e.g. 40 %"),
    plungeFeed: feedSchema.describe("Feed for the entry move, e.g. 500 mm/min").optional(),
    entry: entryMethodSchema,
    rampAngleDeg: z.number().gt(0).max(45).describe("Ramp or helix angle in degrees").optional(),
    notes: z.string().trim().max(1000).optional(),
  })
  .superRefine((op, ctx) => {
    if (op.rampAngleDeg !== undefined && !ENTRY_WITH_ANGLE.has(op.entry)) {
      ctx.addIssue({ code: "custom", path: ["rampAngleDeg"], message: "rampAngleDeg applies only to entry: ramp or entry: helical." });
    }
  });

export type SheetOperation = z.output<typeof sheetOperationSchema>;
export type SheetOperationInput = z.input<typeof sheetOperationSchema>;
