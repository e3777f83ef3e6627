import { z } from "zod";

import { isMachiningInputError, parseFeed, parseLength } from "@/lib/machining";

import { formNumber, optionalFormNumber } from "./catalogue-fields";
import { RIGIDITY_KEYS } from "./machine-rigidity";
import { spindleKindSchema } from "./spindle-kind";

const blankToUndefined = (value: unknown) => (typeof value === "string" && value.trim() === "" ? undefined : value);

/** A feed or length typed with or without its unit (`3000`, `120 in/min`, `3/4"`), to mm or mm/min. */
function quantityText(parse: (text: string) => number, what: string, max: number) {
  return z.preprocess(
    (value) => (typeof value === "number" ? String(value) : value),
    z
      .string({ error: `${what} is required.` })
      .trim()
      .min(1, `${what} is required.`)
      .transform((text, ctx) => {
        try {
          const value = parse(text);
          if (!(value > 0)) throw new RangeError(`${what} must be more than zero.`);
          if (value > max) throw new RangeError(`${what} above ${max} is not plausible for this kind of machine.`);
          return value;
        } catch (error) {
          if (error instanceof RangeError) ctx.addIssue({ code: "custom", message: error.message });
          else if (isMachiningInputError(error)) ctx.addIssue({ code: "custom", message: `${what}: ${error.message}` });
          else throw error;
          return z.NEVER;
        }
      }),
  );
}

/** A customer's machine as entered in the form or sent as JSON; stored in metric machining units. */
export const machineFieldsSchema = z
  .object({
    name: z
      .string({ error: "Give the machine a name." })
      .trim()
      .min(2, "The name needs at least 2 characters.")
      .max(80, "At most 80 characters."),
    preset: z.preprocess(blankToUndefined, z.string().trim().max(60).optional()),
    rpmMin: formNumber("The lowest spindle speed").pipe(
      z.number().gt(0, "The lowest spindle speed must be more than 0 rpm.").max(100000, "At most 100 000 rpm."),
    ),
    rpmMax: formNumber("The highest spindle speed").pipe(
      z.number().gt(0, "The highest spindle speed must be more than 0 rpm.").max(100000, "At most 100 000 rpm."),
    ),
    powerKw: formNumber("Spindle power").pipe(
      z.number().gt(0, "Spindle power must be more than 0 kW.").max(100, "Spindle power above 100 kW is not plausible."),
    ),
    maxFeedMmMin: quantityText((t) => parseFeed(t), "The highest feed", 200000),
    rigidity: z.enum(RIGIDITY_KEYS, { error: "Choose how stiff the machine is." }),
    zThrustN: optionalFormNumber("Z thrust").pipe(
      z.number().gt(0, "Z thrust must be more than 0 N, or left empty.").max(100000).optional(),
    ),
    spindleKind: spindleKindSchema,
    ratedRpm: optionalFormNumber("Rated speed").pipe(
      z.number().gt(0, "The rated speed must be more than 0 rpm, or left empty.").max(100000, "At most 100 000 rpm.").optional(),
    ),
    stickoutMm: z.preprocess(blankToUndefined, quantityText((t) => parseLength(t), "Stick-out", 300).optional()),
    units: z.enum(["metric", "imperial"], { error: "Units are metric or imperial." }).default("metric"),
  })
  // `when` lets this check run even while other fields are wrong, so every problem shows at once.
  .refine((m) => m.rpmMin <= m.rpmMax, {
    path: ["rpmMin"],
    message: "The lowest spindle speed is above the highest: check the two numbers.",
    when: (payload) => {
      const v = payload.value as { rpmMin?: unknown; rpmMax?: unknown };
      return typeof v?.rpmMin === "number" && typeof v?.rpmMax === "number";
    },
  })
  .refine((m) => m.ratedRpm === undefined || m.ratedRpm <= m.rpmMax, {
    path: ["ratedRpm"],
    message: "The rated speed cannot be above the highest spindle speed.",
    when: (payload) => {
      const v = payload.value as { ratedRpm?: unknown; rpmMax?: unknown };
      return typeof v?.ratedRpm === "number" && typeof v?.rpmMax === "number";
    },
  });

export type MachineFields = z.output<typeof machineFieldsSchema>;
export type MachineFieldsInput = z.input<typeof machineFieldsSchema>;

/** The same fields in a server-action form, with the vendor and (for an edit) the machine's id. */
export const machineFormSchema = machineFieldsSchema.and(
  z.object({ vendor: z.string().min(1), id: z.preprocess(blankToUndefined, z.uuid().optional()) }),
);
export const machineDeleteSchema = z.object({ vendor: z.string().min(1), id: z.uuid("Unknown machine.") });
