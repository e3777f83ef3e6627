import { z } from "zod";

import { catalogueSlugSchema, formNumber, optionalFormNumber } from "./catalogue-fields";
import { cautionKindSchema } from "./sheet-kinds";

export const materialGroups = ["plastics", "wood", "non-ferrous", "ferrous", "composites"] as const;
export const materialGroupLabels: Record<(typeof materialGroups)[number], string> = {
  plastics: "Plastics",
  wood: "Wood and wood composites",
  "non-ferrous": "Non-ferrous metals",
  ferrous: "Ferrous metals",
  composites: "Composites",
};

/**
 * Typical router chip-load bands per tooth, as % of the cutter diameter (common practice, from memory; a vendor
 * overrides them per material). The same values fill existing materials in the migration that added the band.
 */
export const CHIP_BAND_PCT_BY_GROUP: Record<(typeof materialGroups)[number], { min: number; max: number }> = {
  plastics: { min: 1.2, max: 3 },
  wood: { min: 1.2, max: 3 },
  "non-ferrous": { min: 0.5, max: 1.5 },
  composites: { min: 0.5, max: 1.5 },
  ferrous: { min: 0.3, max: 1 },
};

export const materialCautionSchema = z.object({ kind: cautionKindSchema, text: z.string().trim().min(1).max(500) });
export type MaterialCaution = z.output<typeof materialCautionSchema>;

const list = (value: unknown) =>
  typeof value === "string"
    ? value
        .split(/[,\n]/)
        .map((s) => s.trim())
        .filter(Boolean)
    : value;

// In a form, one caution per line: `melting: Keep the feed up.` (a line without a known kind is "general").
const cautionLines = (value: unknown) => {
  if (typeof value !== "string") return value;
  return value
    .split("\n")
    .map((line) => line.trim())
    .filter(Boolean)
    .map((line) => {
      const match = /^([a-z]+)\s*:\s*(.+)$/.exec(line);
      return match && cautionKindSchema.safeParse(match[1]).success ? { kind: match[1], text: match[2] } : { kind: "general", text: line };
    });
};

export const materialFieldsSchema = z
  .object({
    slug: catalogueSlugSchema,
    name: z.string().trim().min(2, "Name needs at least 2 characters.").max(120),
    materialGroup: z.enum(materialGroups, { error: "Pick a material group." }),
    vcMinMpm: formNumber("Lowest vc").pipe(z.number().gt(0, "vc must be more than 0 m/min.").max(3000)),
    vcMaxMpm: formNumber("Highest vc").pipe(z.number().gt(0, "vc must be more than 0 m/min.").max(3000)),
    minChipLoadMm: formNumber("Minimum chip load").pipe(z.number().min(0).max(2, "A minimum chip load above 2 mm is not plausible.")),
    kcNmm2: formNumber("kc").pipe(z.number().gt(0, "kc must be more than 0 N/mm².").max(10000)),
    // Blank takes the group's typical band (CHIP_BAND_PCT_BY_GROUP).
    chipLoadMinPctD: optionalFormNumber("Lowest chip load (% of D)").pipe(
      z
        .number()
        .gt(0, "The lowest chip load must be more than 0 % of D.")
        .max(20, "A chip load above 20 % of D is not plausible.")
        .optional(),
    ),
    chipLoadMaxPctD: optionalFormNumber("Highest chip load (% of D)").pipe(
      z
        .number()
        .gt(0, "The highest chip load must be more than 0 % of D.")
        .max(20, "A chip load above 20 % of D is not plausible.")
        .optional(),
    ),
    kc11Nmm2: optionalFormNumber("kc1.1").pipe(z.number().gt(0, "kc1.1 must be more than 0 N/mm², or left empty.").max(10000).optional()),
    mc: optionalFormNumber("mc").pipe(
      z.number().min(0, "mc is between 0 and 1.").lt(1, "mc is between 0 and 1 (typically 0.2–0.4).").optional(),
    ),
    synonyms: z.preprocess(list, z.array(z.string().trim().min(1).max(60)).max(30)).default([]),
    cautions: z.preprocess(cautionLines, z.array(materialCautionSchema).max(20)).default([]),
    notes: z.string().trim().max(2000).default(""),
  })
  .refine((m) => m.vcMaxMpm >= m.vcMinMpm, { path: ["vcMaxMpm"], message: "The highest vc cannot be below the lowest." })
  .refine((m) => m.mc === undefined || m.kc11Nmm2 !== undefined, { path: ["kc11Nmm2"], message: "mc needs kc1.1: give both, or neither." })
  .transform((m) => {
    const band = CHIP_BAND_PCT_BY_GROUP[m.materialGroup];
    return { ...m, chipLoadMinPctD: m.chipLoadMinPctD ?? band.min, chipLoadMaxPctD: m.chipLoadMaxPctD ?? band.max };
  })
  .refine((m) => m.chipLoadMaxPctD >= m.chipLoadMinPctD, {
    path: ["chipLoadMaxPctD"],
    message: "The highest chip load cannot be below the lowest.",
  });

export type MaterialFields = z.output<typeof materialFieldsSchema>;
export type MaterialFieldsInput = z.input<typeof materialFieldsSchema>;
