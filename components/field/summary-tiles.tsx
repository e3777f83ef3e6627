import { percent } from "@/lib/field/confidence";
import { getFieldSummary } from "@/lib/field/field-summary";

/** The vendor's totals across every version. */
export async function SummaryTiles({ vendorId }: { vendorId: string }) {
  const summary = await getFieldSummary({ vendorId });
  const tiles = [
    ["Outcome reports", summary.outcomes],
    ["Failed", summary.outcomes ? `${summary.failed} (${percent(summary.failed / summary.outcomes)})` : 0],
    ["Setups saved", summary.setups],
    ["Adaptations", summary.adaptations],
    ["Library views", summary.views],
    ["Open hand-offs", summary.openHandoffs],
  ] as const;
  return (
    <dl className="mt-6 grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-6">
      {tiles.map(([name, value]) => (
        <div key={name} className="rounded-lg border border-stone-200 bg-white p-4">
          <dt className="text-sm text-stone-600">{name}</dt>
          <dd className="num mt-1 text-xl font-semibold">{value}</dd>
        </div>
      ))}
    </dl>
  );
}
