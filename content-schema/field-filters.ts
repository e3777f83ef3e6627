import { z } from "zod";

import { CHANGEABLE_PARAMS } from "./outcome-fields";

// Search params and form fields of Field results: parsed where they enter, answered with a sentence when wrong.

const isoDate = z.iso.date({ error: "Write dates as YYYY-MM-DD." });
const blank = (v: unknown) => (v === "" || v === null ? undefined : v);
const first = (v: unknown) => (Array.isArray(v) ? v[0] : v);
const optionalDate = z.preprocess((v) => blank(first(v)), isoDate.optional());

/** The longest range a page lists or charts: about three years of weeks. */
export const MAX_RANGE_DAYS = 3 * 366;

const dayMs = 86_400_000;
const rangeChecks = <T extends { from?: string; to?: string }>(r: T, ctx: z.RefinementCtx) => {
  if (r.from && r.to && r.from > r.to) ctx.addIssue({ code: "custom", path: ["to"], message: "The end date is before the start date." });
  if (r.from && r.to && (Date.parse(r.to) - Date.parse(r.from)) / dayMs > MAX_RANGE_DAYS) {
    ctx.addIssue({ code: "custom", path: ["to"], message: "Choose a range of at most three years." });
  }
};

/** Filters of the vendor-wide Needs-attention list: outcome reports dated from–to (inclusive), one machine class. */
export const attentionFilterSchema = z
  .object({
    from: optionalDate,
    to: optionalDate,
    class: z.preprocess(
      (v) => blank(first(v)),
      z
        .string()
        .trim()
        .max(80)
        .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, "Pick a machine class from the list.")
        .optional(),
    ),
  })
  .superRefine(rangeChecks);
export type AttentionFilter = z.output<typeof attentionFilterSchema>;

/** The date range of a sheet's trends; both ends optional (the page fills in the last 26 weeks). */
export const trendRangeSchema = z.object({ from: optionalDate, to: optionalDate }).superRefine(rangeChecks);
export type TrendRange = z.output<typeof trendRangeSchema>;

/** Which suggestion to start a draft from; the numbers are the server's. */
export const startDraftFromChangeSchema = z.object({
  versionId: z.uuid({ error: "Unknown sheet version." }),
  operationIndex: z.coerce.number().int().min(0).max(99),
  param: z.enum(CHANGEABLE_PARAMS, { error: "Unknown parameter." }),
});
