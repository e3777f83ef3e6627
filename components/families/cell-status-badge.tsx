import { cellStatusLabels, type CellStatus } from "@/lib/families/cell-status";

const STYLE: Record<CellStatus, [icon: string, className: string]> = {
  new: ["+", "border-green-700 text-green-900"],
  changed: ["↻", "border-amber-500 text-amber-900"],
  unchanged: ["=", "border-stone-400 text-stone-700"],
  warned: ["⚠", "border-red-700 text-red-900"],
  busy: ["✎", "border-stone-400 text-stone-700"],
};

/** What generating a cell would do: an icon and a word, never colour alone. */
export function CellStatusBadge({ status }: { status: CellStatus }) {
  const [icon, className] = STYLE[status];
  return (
    <span
      data-status={status}
      className={`inline-flex items-center gap-1 rounded border bg-white px-1.5 py-0.5 text-xs font-medium whitespace-nowrap ${className}`}
    >
      <span aria-hidden>{icon}</span>
      {cellStatusLabels[status]}
    </span>
  );
}
