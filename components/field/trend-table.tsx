import { percent } from "@/lib/field/confidence";
import type { TrendWeek } from "@/lib/field/week-series";
import { formatDate } from "@/lib/ui/dates";

import { IntervalBar } from "./interval-bar";

/** The trend as a table: the same numbers as the chart, readable without it. */
export function TrendTable({ weeks, confidenceLabel }: { weeks: TrendWeek[]; confidenceLabel: string }) {
  return (
    // A scrolling region a keyboard can reach and a screen reader can name.
    <div
      role="region"
      aria-label="Weekly trend table"
      tabIndex={0}
      className="max-h-96 overflow-auto rounded-md border border-stone-300 bg-white"
    >
      <table className="w-full text-left text-sm" data-testid="trend-table">
        <caption className="sr-only">Outcome reports and failure share per week, with the versions published that week</caption>
        <thead className="sticky top-0 bg-stone-100 text-stone-700">
          <tr>
            <th scope="col" className="px-3 py-2">
              Week of
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Reports
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Failed
            </th>
            <th scope="col" className="px-3 py-2">
              Failure share ({confidenceLabel} interval)
            </th>
            <th scope="col" className="px-3 py-2">
              Published
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-stone-200">
          {weeks.map((w) => (
            <tr key={w.week} data-week={w.week} data-reports={w.outcomes} data-failed={w.failed}>
              <th scope="row" className="num px-3 py-2 font-normal">
                {formatDate(`${w.week}T00:00:00Z`)}
              </th>
              <td className="num px-3 py-2 text-right">{w.outcomes}</td>
              <td className="num px-3 py-2 text-right">{w.failed}</td>
              <td className="px-3 py-2">
                {w.outcomes ? (
                  <>
                    <IntervalBar interval={w.failure} label={confidenceLabel} />
                    <span className="sr-only">observed {percent(w.failure.share)}</span>
                  </>
                ) : (
                  <span className="text-stone-500">no reports</span>
                )}
              </td>
              <td className="px-3 py-2">{w.published.length ? w.published.map((n) => `Version ${n}`).join(", ") : ""}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
