import { z } from "zod";

import { sheetCautionSchema } from "./sheet-caution";
import { sheetOperationSchema } from "./sheet-operation";

export type { Quantity, RadialDepth } from "./quantity";
export * from "./sheet-caution";
export * from "./sheet-kinds";
export * from "./sheet-operation";

const slug = (what: string) =>
  z
    .string()
    .trim()
    .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, `${what} is a slug: lowercase letters, digits and single hyphens, e.g. cast-acrylic`);

/** The YAML front matter of one sheet version: the structured cutting data. */
export const sheetFrontMatterSchema = z.strictObject({
  title: z.string().trim().min(1).max(120),
  summary: z.string().trim().min(1).max(400),
  cutter: z.string().trim().min(1).max(64).describe("The vendor's cutter SKU"),
  material: slug("material").describe("Material slug"),
  machineClass: slug("machineClass").describe("Machine class slug"),
  operations: z.array(sheetOperationSchema).min(1, "A sheet needs at least one operation."),
  cautions: z.array(sheetCautionSchema).default([]),
  tags: z.array(z.string().trim().min(1).max(40)).max(20).default([]),
});

export type SheetFrontMatter = z.output<typeof sheetFrontMatterSchema>;
export type SheetFrontMatterInput = z.input<typeof sheetFrontMatterSchema>;
