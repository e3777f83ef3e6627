import { wilsonInterval, type Interval } from "./wilson";

// Pure: week-by-week series for Field-results trends. Weeks start on Monday, in UTC, as in the weekly rollup.

const DAY_MS = 86_400_000;

/** The Monday (UTC) of the week `at` falls in, as YYYY-MM-DD. */
export function weekStartOf(at: Date): string {
  const day = new Date(Date.UTC(at.getUTCFullYear(), at.getUTCMonth(), at.getUTCDate()));
  day.setUTCDate(day.getUTCDate() - ((day.getUTCDay() + 6) % 7));
  return day.toISOString().slice(0, 10);
}

/** Every Monday from the week of `from` to the week of `to` (YYYY-MM-DD, inclusive). */
export function weeksBetween(from: string, to: string): string[] {
  const weeks: string[] = [];
  const last = Date.parse(weekStartOf(new Date(`${to}T00:00:00Z`)));
  for (let t = Date.parse(weekStartOf(new Date(`${from}T00:00:00Z`))); t <= last; t += 7 * DAY_MS)
    weeks.push(new Date(t).toISOString().slice(0, 10));
  return weeks;
}

/** The default trends range: the 26 weeks up to and including `today`'s. */
export function defaultTrendRange(today: Date): { from: string; to: string } {
  const to = today.toISOString().slice(0, 10);
  const from = new Date(Date.parse(weekStartOf(today)) - 25 * 7 * DAY_MS).toISOString().slice(0, 10);
  return { from, to };
}

export type WeekCounts = { week: string; outcomes: number; failed: number };
export type Publication = { number: number; publishedAt: string };
export type TrendWeek = WeekCounts & { failure: Interval; published: number[] };

/**
 * One row per week of the range, weeks without reports included (as zeros), each with its failure share and
 * interval and the version numbers published that week.
 */
export function weekSeries(rows: WeekCounts[], range: { from: string; to: string }, publications: Publication[], z: number): TrendWeek[] {
  const byWeek = new Map<string, WeekCounts>();
  for (const r of rows) {
    const seen = byWeek.get(r.week);
    byWeek.set(r.week, seen ? { week: r.week, outcomes: seen.outcomes + r.outcomes, failed: seen.failed + r.failed } : { ...r });
  }
  return weeksBetween(range.from, range.to).map((week) => {
    const counts = byWeek.get(week) ?? { week, outcomes: 0, failed: 0 };
    const published = publications.filter((p) => weekStartOf(new Date(p.publishedAt)) === week).map((p) => p.number);
    return { ...counts, failure: wilsonInterval(counts.failed, counts.outcomes, z), published };
  });
}
