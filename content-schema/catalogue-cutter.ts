import { z } from "zod";

import { formNumber, optionalFormNumber, optionalText } from "./catalogue-fields";

export const cornerForms = ["square", "ball", "corner-radius"] as const;
export const toolMaterials = ["carbide", "hss"] as const;
export const cutterGeometries = ["straight", "single-flute", "upcut", "downcut", "compression", "o-flute"] as const;

export const cornerFormLabels: Record<(typeof cornerForms)[number], string> = {
  square: "Square end",
  ball: "Ball nose",
  "corner-radius": "Corner radius",
};
export const geometryLabels: Record<(typeof cutterGeometries)[number], string> = {
  straight: "Straight flute",
  "single-flute": "Single-flute plastic cutter",
  upcut: "Up-cut spiral",
  downcut: "Down-cut spiral",
  compression: "Compression",
  "o-flute": "O-flute",
};

/** A cutter as entered in a form, a CSV row or a JSON body; sizes in mm (ISO 13399 names in comments). */
export const cutterFieldsSchema = z
  .object({
    sku: z
      .string()
      .trim()
      .min(2, "SKU needs at least 2 characters.")
      .max(64)
      .regex(/^[A-Za-z0-9][A-Za-z0-9._/-]*$/, "SKU: letters, digits, . _ / - only."),
    name: z.string().trim().min(2, "Name needs at least 2 characters.").max(120),
    diameterMm: formNumber("DC (cutting diameter)").pipe(
      z.number().gt(0, "DC must be more than 0 mm.").max(100, "DC above 100 mm is not a router cutter."),
    ),
    flutes: formNumber("ZEFP (flutes)").pipe(
      z.number().int("ZEFP is a whole number.").min(1, "At least 1 flute.").max(12, "At most 12 flutes."),
    ),
    fluteLengthMm: formNumber("APMX (flute length)").pipe(z.number().gt(0, "APMX must be more than 0 mm.").max(300)),
    overallLengthMm: formNumber("OAL (overall length)").pipe(z.number().gt(0, "OAL must be more than 0 mm.").max(500)),
    shankMm: formNumber("DMM (shank diameter)").pipe(z.number().gt(0, "DMM must be more than 0 mm.").max(50)),
    cornerForm: z.enum(cornerForms, { error: `Corner form is one of ${cornerForms.join(", ")}.` }).default("square"),
    cornerRadiusMm: optionalFormNumber("RE (corner radius)").pipe(z.number().gt(0, "RE must be more than 0 mm.").optional()),
    helixDeg: optionalFormNumber("Helix angle").pipe(z.number().min(0).max(60, "Helix angle is at most 60°.").optional()),
    toolMaterial: z.enum(toolMaterials, { error: "Tool material is carbide or hss." }).default("carbide"),
    coating: optionalText(60),
    geometry: z.enum(cutterGeometries, { error: `Geometry is one of ${cutterGeometries.join(", ")}.` }).default("straight"),
    notes: z.string().trim().max(2000).default(""),
  })
  .superRefine((c, ctx) => {
    if (c.overallLengthMm < c.fluteLengthMm)
      ctx.addIssue({ code: "custom", path: ["overallLengthMm"], message: "OAL cannot be shorter than APMX." });
    if (c.cornerForm === "corner-radius" && c.cornerRadiusMm === undefined) {
      ctx.addIssue({ code: "custom", path: ["cornerRadiusMm"], message: "A corner-radius cutter needs RE." });
    }
    if (c.cornerRadiusMm !== undefined && c.cornerRadiusMm > c.diameterMm / 2) {
      ctx.addIssue({ code: "custom", path: ["cornerRadiusMm"], message: "RE cannot exceed half of DC." });
    }
  });

export type CutterFields = z.output<typeof cutterFieldsSchema>;
export type CutterFieldsInput = z.input<typeof cutterFieldsSchema>;

/** CSV header names for each field, as written in an import file. */
export const cutterCsvColumns = {
  sku: "sku",
  name: "name",
  diameterMm: "diameter_mm",
  flutes: "flutes",
  fluteLengthMm: "flute_length_mm",
  overallLengthMm: "overall_length_mm",
  shankMm: "shank_mm",
  cornerForm: "corner_form",
  cornerRadiusMm: "corner_radius_mm",
  helixDeg: "helix_deg",
  toolMaterial: "tool_material",
  coating: "coating",
  geometry: "geometry",
  notes: "notes",
} as const satisfies Record<keyof CutterFields, string>;

export const requiredCutterCsvColumns = [
  "sku",
  "name",
  "diameter_mm",
  "flutes",
  "flute_length_mm",
  "overall_length_mm",
  "shank_mm",
] as const;
