import { findSheetResults } from "@/lib/field/page-data";
import { publicationVerdict } from "@/lib/field/publication-verdict";
import { getSheetTrends } from "@/lib/field/sheet-trends";
import { formatDate } from "@/lib/ui/dates";

import { LazyTrendChart } from "./trend-chart-lazy";
import { TrendTable } from "./trend-table";

const VERDICT_STYLE = {
  fell: "border-green-700 bg-green-50",
  rose: "border-red-700 bg-red-50",
  not_yet_clear: "border-amber-400 bg-amber-50",
  single_version: "border-stone-300 bg-white",
} as const;

/** Reports and failure share week by week over the chosen range, publications marked, and the verdict on the latest. */
export async function SheetTrendsSection({
  vendorSlug,
  vendorId,
  sheetSlug,
  sheetId,
  from,
  to,
  z,
  confidenceLabel,
}: {
  vendorSlug: string;
  vendorId: string;
  sheetSlug: string;
  sheetId: string;
  from: string;
  to: string;
  z: number;
  confidenceLabel: string;
}) {
  const [trends, results] = await Promise.all([getSheetTrends({ vendorId, sheetId, from, to, z }), findSheetResults(vendorId, sheetId, z)]);
  const verdict = publicationVerdict(results?.versions ?? [], confidenceLabel);
  const points = trends.weeks.map((w) => ({
    week: w.week,
    label: formatDate(`${w.week}T00:00:00Z`),
    reports: w.outcomes,
    failedPct: w.outcomes ? Math.round(w.failure.share * 1000) / 10 : null,
    published: w.published.map((n) => `v${n}`).join(", "),
  }));
  return (
    <>
      <p
        data-testid="publication-verdict"
        data-verdict={verdict.verdict}
        className={`mb-4 rounded-md border px-4 py-3 text-sm ${VERDICT_STYLE[verdict.verdict]}`}
      >
        <strong>{verdict.headline}.</strong> {verdict.detail}
      </p>
      <div className="mb-4 rounded-md border border-stone-300 bg-white p-4">
        <LazyTrendChart data={points} />
      </div>
      <div className="mb-2 flex justify-end">
        <a
          href={`/api/v1/vendors/${vendorSlug}/field/sheet-trends?${new URLSearchParams({ sheet: sheetSlug, from, to })}`}
          className="inline-flex min-h-11 items-center rounded border border-stone-300 bg-white px-3 text-sm"
          download
        >
          Export CSV<span className="sr-only"> of the weekly trends</span>
        </a>
      </div>
      <TrendTable weeks={trends.weeks} confidenceLabel={confidenceLabel} />
    </>
  );
}
