import { StateBadge } from "@/components/drafting/state-badge";
import { formatDate } from "@/components/library/format-date";
import type { SheetState } from "@/content-schema/sheet-workflow";
import { percent } from "@/lib/field/confidence";
import type { VersionRollup } from "@/lib/field/rollup-rows";

import { IntervalBar } from "./interval-bar";

const COLUMNS = ["Views", "Adaptations", "Setups", "Reports", "As written", "After changes", "Failed"] as const;

/** Every version of one sheet, oldest first: reach, reports and the failure interval. */
export function VersionRollupTable({ versions, confidenceLabel }: { versions: VersionRollup[]; confidenceLabel: string }) {
  return (
    <div className="overflow-x-auto rounded-md border border-stone-300 bg-white">
      <table className="w-full text-left text-sm" data-testid="version-rollups">
        <thead className="bg-stone-100 text-stone-700">
          <tr>
            <th scope="col" className="px-3 py-2">
              Version
            </th>
            {COLUMNS.map((c) => (
              <th key={c} scope="col" className="px-3 py-2 text-right">
                {c}
              </th>
            ))}
            <th scope="col" className="px-3 py-2">
              Failure share ({confidenceLabel})
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Tickets
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Hand-offs
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-stone-200">
          {versions.map((v) => (
            <tr key={v.versionId}>
              <th scope="row" className="px-3 py-2 font-medium">
                <span className="num">v{v.number}</span> <StateBadge state={v.state as SheetState} />
                <span className="block text-xs font-normal text-stone-500">published {formatDate(v.publishedAt)}</span>
              </th>
              {[v.views, v.adaptations, v.setups, v.outcomes, v.workedAsWritten, v.workedAfterChanges, v.failed].map((n, i) => (
                <td key={COLUMNS[i]} className="num px-3 py-2 text-right">
                  {n}
                </td>
              ))}
              <td className="px-3 py-2">
                {v.outcomes ? (
                  <IntervalBar interval={v.failure} label={confidenceLabel} />
                ) : (
                  <span className="text-stone-500">no reports</span>
                )}
                {v.outcomes ? <span className="sr-only">observed {percent(v.failure.share)}</span> : null}
              </td>
              <td className="num px-3 py-2 text-right">{v.tickets}</td>
              <td className="num px-3 py-2 text-right">{v.handoffs}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
