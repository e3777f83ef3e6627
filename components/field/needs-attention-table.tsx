import Link from "next/link";

import { EmptyState } from "@/components/ui/empty-state";
import { outcomeSymptomLabels } from "@/content-schema/outcome-fields";
import { percent } from "@/lib/field/confidence";
import type { AttentionItem } from "@/lib/field/needs-attention";
import { topSymptom } from "@/lib/field/rollup-rows";

import { IntervalBar } from "./interval-bar";

export function NeedsAttentionTable({
  items,
  vendorSlug,
  confidenceLabel,
}: {
  items: AttentionItem[];
  vendorSlug: string;
  confidenceLabel: string;
}) {
  if (!items.length) return <EmptyState title="Nothing needs attention">No published version has a failed outcome report.</EmptyState>;
  return (
    <div className="overflow-x-auto rounded-md border border-stone-300 bg-white">
      <table className="w-full text-left text-sm" data-testid="needs-attention">
        <thead className="bg-stone-100 text-stone-700">
          <tr>
            <th scope="col" className="px-3 py-2">
              #
            </th>
            <th scope="col" className="px-3 py-2">
              Sheet version
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Failed / reports
            </th>
            <th scope="col" className="px-3 py-2">
              Failure share ({confidenceLabel} interval)
            </th>
            <th scope="col" className="px-3 py-2">
              Mostly
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Tickets
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Open hand-offs
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-stone-200">
          {items.map((item, i) => {
            const symptom = topSymptom(item.symptoms);
            return (
              <tr key={item.versionId} data-sheet={item.sheetSlug} data-lower-bound={item.lowerBound.toFixed(6)}>
                <td className="num px-3 py-2 text-stone-500">{i + 1}</td>
                <td className="px-3 py-2">
                  <Link className="font-medium underline" href={`/${vendorSlug}/drafting/field/${item.sheetSlug}`}>
                    {item.title}
                  </Link>
                  <span className="num ml-2 text-stone-600">v{item.number}</span>
                  <span className="block text-xs text-stone-500">{item.machineClass}</span>
                </td>
                <td className="num px-3 py-2 text-right">
                  {item.failed} / {item.outcomes}
                </td>
                <td className="px-3 py-2">
                  <IntervalBar interval={item.failure} label={confidenceLabel} />
                  <span className="sr-only">observed {percent(item.failure.share)}</span>
                </td>
                <td className="px-3 py-2">{symptom ? outcomeSymptomLabels[symptom] : "–"}</td>
                <td className="num px-3 py-2 text-right">{item.tickets}</td>
                <td className="num px-3 py-2 text-right">{item.openHandoffs}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
