import { z } from "zod";

import { isMachiningInputError, parseLength } from "@/lib/machining";

import { ENTRY_CAPABILITY_KEYS } from "./entry-capability-labels";

export { ENTRY_CAPABILITY_KEYS, entryCapabilityLabels, type EntryCapabilityKey } from "./entry-capability-labels";

/** An override typed as `1/8`, `3.175 mm` or `0.125"`; blank means "use the sheet's". Result in mm. */
export const lengthOverrideSchema = (what: string) =>
  z.preprocess(
    (value) => (typeof value === "number" ? String(value) : typeof value === "string" && value.trim() === "" ? undefined : value),
    z
      .string()
      .trim()
      .transform((text, ctx) => {
        try {
          const mm = parseLength(text, { field: what });
          if (!(mm > 0)) throw new RangeError(`${what} must be more than zero.`);
          return mm;
        } catch (error) {
          if (error instanceof RangeError) ctx.addIssue({ code: "custom", message: error.message });
          else if (isMachiningInputError(error)) ctx.addIssue({ code: "custom", message: `${what}: ${error.message}` });
          else throw error;
          return z.NEVER;
        }
      })
      .optional(),
  );

export const entryCapabilitySchema = z
  .enum(ENTRY_CAPABILITY_KEYS, { error: "Choose how your CAM enters the material: straight plunge only, ramp or helix." })
  .default("ramp");

export const setupOverridesSchema = z.object({
  radialDepthMm: lengthOverrideSchema("ae"),
  axialDepthMm: lengthOverrideSchema("ap"),
  stickoutMm: lengthOverrideSchema("Stick-out"),
});
export type SetupOverrides = z.output<typeof setupOverridesSchema>;

/** Saving an adapted sheet as a setup: only references and overrides; the server computes the numbers. */
export const setupCreateSchema = z
  .object({
    versionId: z.uuid("Unknown sheet version."),
    machineId: z.uuid("Choose one of your machines."),
    operationIndex: z.coerce.number().int().min(0).max(50).default(0),
    name: z.string().trim().max(120, "At most 120 characters.").default(""),
    units: z.enum(["metric", "imperial"]).default("metric"),
    entryCapability: entryCapabilitySchema,
  })
  .and(setupOverridesSchema);
export type SetupCreate = z.output<typeof setupCreateSchema>;

export const setupActionSchema = setupCreateSchema.and(z.object({ vendor: z.string().min(1) }));
