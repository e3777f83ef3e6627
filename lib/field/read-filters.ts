import {
  attentionFilterSchema,
  MAX_RANGE_DAYS,
  trendRangeSchema,
  type AttentionFilter,
  type TrendRange,
} from "@/content-schema/field-filters";

import { defaultTrendRange } from "./week-series";

// Pure: Field-results search params, validated; a wrong value is named in a sentence and left out, never a crash.

type Raw = Record<string, string | string[] | undefined>;
const sentence = (issues: { message: string }[]) => `${issues.map((i) => i.message).join(" ")} Showing the list without that filter.`;

export function readAttentionFilter(raw: Raw): { filter: AttentionFilter; error: string | null } {
  const parsed = attentionFilterSchema.safeParse(raw);
  return parsed.success ? { filter: parsed.data, error: null } : { filter: {}, error: sentence(parsed.error.issues) };
}

/** The trends range: the chosen one, or the last 26 weeks for what is left out or wrong. */
export function readTrendRange(raw: Raw, today: Date): { range: Required<TrendRange>; chosen: TrendRange; error: string | null } {
  const fallback = defaultTrendRange(today);
  const parsed = trendRangeSchema.safeParse(raw);
  if (!parsed.success)
    return { range: fallback, chosen: {}, error: `${parsed.error.issues.map((i) => i.message).join(" ")} Showing the last 26 weeks.` };
  const to = parsed.data.to ?? (parsed.data.from && parsed.data.from > fallback.to ? parsed.data.from : fallback.to);
  const from = parsed.data.from ?? (to < fallback.from ? to : fallback.from);
  if ((Date.parse(to) - Date.parse(from)) / 86_400_000 > MAX_RANGE_DAYS)
    return { range: fallback, chosen: {}, error: "Choose a range of at most three years. Showing the last 26 weeks." };
  return { range: { from, to }, chosen: parsed.data, error: null };
}
