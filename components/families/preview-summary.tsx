import { cellStatusLabels, type CellStatus } from "@/lib/families/cell-status";

/** How many cells of the preview would do what. */
export function PreviewSummary({ counts, shown, total }: { counts: Record<CellStatus, number>; shown: number; total: number }) {
  return (
    <dl className="flex flex-wrap gap-3 text-sm" data-testid="preview-counts">
      {(Object.keys(counts) as CellStatus[]).map((status) => (
        <div key={status} data-count={status} className="rounded border border-stone-300 bg-white px-3 py-2">
          <dt className="text-stone-600">{cellStatusLabels[status]}</dt>
          <dd className="num text-lg font-semibold">{counts[status]}</dd>
        </div>
      ))}
      <p className="self-end text-stone-600">{shown === total ? `${total} cells` : `${shown} of ${total} cells shown`}</p>
    </dl>
  );
}
