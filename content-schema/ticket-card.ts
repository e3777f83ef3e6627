import { z } from "zod";

const num = z.number();
const nullableNum = z.number().nullable();

export const cardNumbersSchema = z.object({
  rpm: num,
  feedMmMin: num,
  chipLoadMm: num,
  maxChipThicknessMm: num,
  cuttingSpeedMpm: num,
  axialDepthMm: num,
  radialDepthMm: num,
  plungeFeedMmMin: nullableNum,
  mrrCm3Min: num,
  powerKw: nullableNum,
  torqueNm: nullableNum,
  forceN: nullableNum,
  deflectionMm: nullableNum,
});

export const cardOperationSchema = z.object({
  label: z.string(),
  kind: z.string(),
  // The sheet's own numbers; fz, vc and the plunge feed were added later, so older cards lack them.
  reference: z.object({
    rpm: num,
    feedMmMin: num,
    axialDepthMm: num,
    radialDepthMm: num,
    chipLoadMm: num.optional(),
    cuttingSpeedMpm: num.optional(),
    plungeFeedMmMin: nullableNum.optional(),
  }),
  adapted: cardNumbersSchema.nullable(),
  error: z.string().optional(),
  steps: z.array(
    z.object({
      rule: z.string(),
      title: z.string(),
      field: z.string(),
      quantity: z.string(),
      before: num,
      after: num,
      why: z.string(),
      source: z.string(),
    }),
  ),
  warnings: z.array(z.object({ code: z.string(), title: z.string(), message: z.string() })),
});

/** A sheet version adapted to one customer machine, computed when the reply was written and stored with it. */
export const ticketCardSchema = z.object({
  sheetVersionId: z.uuid(),
  sheetSlug: z.string(),
  versionNumber: z.number().int(),
  title: z.string(),
  machine: z.object({ id: z.uuid(), name: z.string(), units: z.enum(["metric", "imperial"]) }),
  operations: z.array(cardOperationSchema),
  cautions: z.array(z.object({ kind: z.string(), text: z.string() })),
  computedAt: z.string(),
});
export type TicketCard = z.infer<typeof ticketCardSchema>;
export type TicketCardOperation = z.infer<typeof cardOperationSchema>;
