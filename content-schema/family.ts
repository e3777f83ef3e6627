import { parse as parseYaml, stringify as stringifyYaml } from "yaml";
import { z } from "zod";

import { cutterGeometries } from "./catalogue-cutter";
import { catalogueSlugSchema } from "./catalogue-fields";
import { materialGroups } from "./catalogue-material";
import { entryMethodSchema, operationKindSchema } from "./sheet-kinds";

// A sheet family: a set of cutters × materials × machine classes, and versioned rules that say how the engine
// derives each operation. Every rule field is optional: absent, the material's own data decides (the engine's
// default position in its cutting-speed window and chip-load band, the operation's usual depths).

/** Which cutters a family covers; all given filters apply together. */
export const cutterSelectionSchema = z
  .strictObject({
    series: z.string().trim().max(40).optional().describe("SKU prefix of the series, e.g. SF-"),
    geometries: z.array(z.enum(cutterGeometries)).max(cutterGeometries.length).default([]),
    diameterMinMm: z.number().positive().max(100).optional(),
    diameterMaxMm: z.number().positive().max(100).optional(),
    skus: z.array(z.string().trim().min(1).max(64)).max(2000).default([]),
  })
  .refine((s) => s.diameterMinMm === undefined || s.diameterMaxMm === undefined || s.diameterMinMm <= s.diameterMaxMm, {
    message: "The smallest diameter must not be larger than the largest.",
    path: ["diameterMaxMm"],
  });
export type CutterSelection = z.output<typeof cutterSelectionSchema>;

/** The numbers one rule sets; shares are 0 (lowest) to 1 (highest), depths are multiples of the cutter diameter. */
export const familyRuleFieldsSchema = z.strictObject({
  vcPosition: z.number().min(0).max(1).optional().describe("Where in the material's vc window to run, 0–1"),
  chipLoadPosition: z.number().min(0).max(1).optional().describe("Where inside the material's chip-load band the chip sits, 0–1"),
  apPerD: z.number().gt(0).max(5).optional().describe("Axial depth ap as a multiple of D"),
  aePerD: z.number().gt(0).max(1).optional().describe("Radial depth ae as a multiple of D (not for slotting)"),
  entry: entryMethodSchema.optional(),
  rampAngleDeg: z.number().gt(0).max(45).optional(),
});

/** One rule: for a material group and operation kind, optionally only on one machine class (slug). */
export const familyRuleSchema = familyRuleFieldsSchema.extend({
  materialGroup: z.enum(materialGroups),
  kind: operationKindSchema,
  machineClass: catalogueSlugSchema.optional(),
});
export type FamilyRule = z.output<typeof familyRuleSchema>;

export const familyRulesSchema = z.strictObject({
  kinds: z.array(operationKindSchema).min(1, "Name at least one operation kind.").max(5),
  rules: z.array(familyRuleSchema).max(300).default([]),
});
export type FamilyRules = z.output<typeof familyRulesSchema>;
export type FamilyRulesInput = z.input<typeof familyRulesSchema>;

export const familyDefinitionSchema = z.object({
  name: z.string().trim().min(2, "Name the family.").max(120),
  slug: catalogueSlugSchema,
  cutters: cutterSelectionSchema,
  materialIds: z.array(z.uuid()).min(1, "Pick at least one material.").max(50),
  machineClassIds: z.array(z.uuid()).min(1, "Pick at least one machine class.").max(20),
});
export type FamilyDefinition = z.output<typeof familyDefinitionSchema>;

export const batchExcludeSchema = z.object({
  itemId: z.uuid(),
  reason: z.string().trim().min(3, "Say why this sheet is left out.").max(500),
});

/** Family rules as an engineer types them (YAML), parsed and then validated by the rules schema. */
export const familyRulesTextSchema = z
  .string()
  .max(50_000, "The rules are at most 50,000 characters.")
  .transform((text, ctx) => {
    try {
      return parseYaml(text) as unknown;
    } catch (error) {
      ctx.addIssue({
        code: "custom",
        message: `The rules are not valid YAML: ${error instanceof Error ? error.message.split("\n")[0] : "unreadable"}`,
      });
      return z.NEVER;
    }
  })
  .pipe(familyRulesSchema);

/** Rules as YAML text for the editor. */
export const familyRulesToText = (rules: FamilyRules) => stringifyYaml(rules, { lineWidth: 0 });

/** The family form as it arrives from the browser (repeated fields, SKUs by line), reshaped and then validated. */
const list = (value: unknown) => (value === undefined ? [] : Array.isArray(value) ? value : [value]);
const given = (value: unknown) => (typeof value === "string" && value.trim() !== "" ? value.trim() : undefined);
const numberGiven = (value: unknown) => (given(value) === undefined ? undefined : Number(String(value).replace(",", ".")));

function reshapeFamilyForm(raw: unknown) {
  const f = (raw ?? {}) as Record<string, unknown>;
  const skus =
    typeof f.skus === "string"
      ? f.skus
          .split(/[\n,]/)
          .map((s) => s.trim())
          .filter(Boolean)
      : [];
  return {
    name: f.name,
    slug: f.slug,
    cutters: {
      series: given(f.series),
      geometries: list(f.geometries),
      diameterMinMm: numberGiven(f.diameterMinMm),
      diameterMaxMm: numberGiven(f.diameterMaxMm),
      skus,
    },
    materialIds: list(f.materialIds),
    machineClassIds: list(f.machineClassIds),
    rules: { kinds: list(f.kinds), rules: [] },
  };
}

export const familyFormSchema = z.preprocess(reshapeFamilyForm, familyDefinitionSchema.extend({ rules: familyRulesSchema }));
