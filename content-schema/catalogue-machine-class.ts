import { z } from "zod";

import { catalogueSlugSchema, formNumber, optionalFormNumber } from "./catalogue-fields";
import { spindleKindSchema } from "./spindle-kind";

export const machineClassFieldsSchema = z
  .object({
    slug: catalogueSlugSchema,
    name: z.string().trim().min(2, "Name needs at least 2 characters.").max(120),
    description: z.string().trim().max(2000).default(""),
    rpmMin: formNumber("Lowest spindle speed").pipe(z.number().gt(0, "Must be more than 0 rpm.").max(100000)),
    rpmMax: formNumber("Highest spindle speed").pipe(z.number().gt(0, "Must be more than 0 rpm.").max(100000)),
    powerKw: formNumber("Spindle power").pipe(z.number().gt(0, "Must be more than 0 kW.").max(100)),
    maxFeedMmMin: formNumber("Highest feed").pipe(z.number().gt(0, "Must be more than 0 mm/min.").max(200000)),
    rigidity: formNumber("Rigidity").pipe(
      z.number().gt(0, "Rigidity is more than 0.").max(1, "Rigidity is at most 1 (the stiffest class)."),
    ),
    zThrustN: optionalFormNumber("Z thrust").pipe(z.number().gt(0, "Must be more than 0 N.").max(100000).optional()),
    spindleKind: spindleKindSchema,
    ratedRpm: optionalFormNumber("Rated speed").pipe(z.number().gt(0, "Must be more than 0 rpm.").max(100000).optional()),
  })
  .refine((m) => m.rpmMax >= m.rpmMin, { path: ["rpmMax"], message: "The highest speed cannot be below the lowest." })
  .refine((m) => m.ratedRpm === undefined || m.ratedRpm <= m.rpmMax, {
    path: ["ratedRpm"],
    message: "The rated speed cannot be above the highest spindle speed.",
  });

export type MachineClassFields = z.output<typeof machineClassFieldsSchema>;
export type MachineClassFieldsInput = z.input<typeof machineClassFieldsSchema>;
