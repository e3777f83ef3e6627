import { z } from "zod";

import { catalogueSlugSchema } from "./catalogue-fields";

export const sheetStates = ["draft", "in_review", "published", "superseded", "withdrawn"] as const;
export type SheetState = (typeof sheetStates)[number];
export const sheetStateLabels: Record<SheetState, string> = {
  draft: "Draft",
  in_review: "In review",
  published: "Published",
  superseded: "Superseded",
  withdrawn: "Withdrawn",
};

export const MAX_SOURCE_CHARS = 100_000;
export const sourceSchema = z.string().max(MAX_SOURCE_CHARS, `A sheet source is at most ${MAX_SOURCE_CHARS} characters.`);
export const sheetSlugSchema = catalogueSlugSchema;

export const newSheetSchema = z.object({
  slug: sheetSlugSchema,
  cutterId: z.uuid("Pick a cutter."),
  materialId: z.uuid("Pick a material."),
  machineClassId: z.uuid("Pick a machine class."),
});

export const apiNewSheetSchema = z.object({ slug: sheetSlugSchema, source: sourceSchema.min(1, "source is required.") });
export const saveDraftSchema = z.object({ source: sourceSchema, revision: z.coerce.number().int().min(0).optional() });
export const submitDraftSchema = z.object({
  changeNote: z.string().trim().min(3, "Say what changed and why (at least 3 characters).").max(1000),
});
export const withdrawSchema = z.object({
  reason: z.string().trim().min(5, "Give readers a reason (at least 5 characters).").max(1000),
  version: z.coerce.number().int().min(1).optional(),
});
