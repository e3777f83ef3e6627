import "server-only";

import { readDb } from "@/lib/db/read-db";

import { weekSeries, weekStartOf, type Publication, type TrendWeek } from "./week-series";

export type SheetTrends = { range: { from: string; to: string }; weeks: TrendWeek[]; publications: Publication[] };

/** One sheet's reports and failures week by week (all its versions together), from the weekly rollup. */
export async function getSheetTrends({
  vendorId,
  sheetId,
  from,
  to,
  z,
}: {
  vendorId: string;
  sheetId: string;
  from: string;
  to: string;
  z: number;
}): Promise<SheetTrends> {
  const db = await readDb();
  const [rows, published] = await Promise.all([
    db("field_week_rollups")
      .where({ vendor_id: vendorId, sheet_id: sheetId })
      .where("week", ">=", weekStartOf(new Date(`${from}T00:00:00Z`)))
      .where("week", "<=", to)
      .groupBy("week")
      .orderBy("week")
      .select(
        db.raw("to_char(week, 'YYYY-MM-DD') as week"),
        db.raw("sum(outcomes)::int as outcomes"),
        db.raw("sum(failed)::int as failed"),
      ),
    db("sheet_versions")
      .where({ vendor_id: vendorId, sheet_id: sheetId })
      .whereIn("state", ["published", "superseded", "withdrawn"])
      .whereNotNull("published_at")
      .orderBy("number")
      .select("number", "published_at"),
  ]);
  const publications = published.flatMap((p) => (p.published_at ? [{ number: p.number, publishedAt: p.published_at.toISOString() }] : []));
  const counts = rows.map((r) => ({ week: String(r.week), outcomes: Number(r.outcomes), failed: Number(r.failed) }));
  return { range: { from, to }, weeks: weekSeries(counts, { from, to }, publications, z), publications };
}
