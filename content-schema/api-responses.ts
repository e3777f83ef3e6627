import { z } from "zod";

import { sheetStates } from "./sheet-workflow";

// Shapes of the public API's answers, for the OpenAPI document; integration tests parse real answers with them.

export const apiErrorSchema = z.object({
  error: z
    .string()
    .describe(
      "A stable code: invalid_input, not_found, unauthenticated, forbidden, conflict, rate_limited, too_large, unsupported_media_type, revision_required, unavailable, internal.",
    ),
  message: z.string().describe("A sentence for people."),
  fieldErrors: z.record(z.string(), z.array(z.string())).optional().describe("Per field (dotted path), what is wrong."),
  current: z.looseObject({}).optional().describe("409 and 428 on drafts: the revision (and text) the server holds."),
});

const displayQuantity = z.object({ value: z.number(), unit: z.string(), text: z.string() });
const inBoth = z.object({ metric: displayQuantity.nullable(), imperial: displayQuantity.nullable() }).partial();

export const calculateResultSchema = z.object({
  units: z.enum(["metric", "imperial"]),
  metric: z.record(z.string(), displayQuantity.nullable()).describe("Every number in metric units."),
  imperial: z.record(z.string(), displayQuantity.nullable()).describe("The same numbers in imperial units."),
  warnings: z.array(
    z.object({ code: z.string(), title: z.string(), message: z.string(), values: z.array(z.looseObject({ name: z.string() })) }),
  ),
  steps: z.array(
    z.object({
      rule: z.string(),
      title: z.string(),
      field: z.string(),
      before: inBoth,
      after: inBoth,
      why: z.string(),
      source: z.unknown(),
    }),
  ),
});

export const sheetVersionResponseSchema = z.looseObject({
  slug: z.string(),
  number: z.int(),
  state: z.enum(sheetStates),
  currentNumber: z.int().nullable(),
  title: z.string(),
  summary: z.string(),
  publishedAt: z.string().nullable(),
  withdrawnReason: z.string().nullable(),
  cutter: z.looseObject({ sku: z.string(), name: z.string(), DC_mm: z.number(), ZEFP: z.int() }),
  material: z.looseObject({ slug: z.string(), name: z.string() }),
  machineClass: z.looseObject({ slug: z.string(), name: z.string(), rpmMin: z.number(), rpmMax: z.number(), powerKw: z.number() }),
  operations: z
    .array(z.looseObject({}))
    .describe("The operations as the sheet's front matter states them (metric values beside the text as written)."),
  cautions: z.array(z.unknown()),
  versions: z.array(z.object({ number: z.int(), state: z.enum(sheetStates), publishedAt: z.string().nullable(), changeNote: z.string() })),
});

export const sheetListResponseSchema = z.object({
  sheets: z.array(
    z.looseObject({ slug: z.string(), title: z.string(), number: z.int(), cutterSku: z.string(), diameterMm: z.number(), flutes: z.int() }),
  ),
});

export const draftStateResponseSchema = z.looseObject({
  number: z.int().optional(),
  state: z.string(),
  revision: z.int().optional(),
  issues: z.array(z.unknown()).optional(),
});

export const ticketCreatedResponseSchema = z.object({ ticket: z.object({ id: z.uuid(), number: z.int(), created: z.boolean() }) });

/** Answers this document describes by their main keys only; they may carry more. */
export const openObject = (description: string) => z.looseObject({}).describe(description);
