import { sheetStateLabels, type SheetState } from "@/content-schema/sheet-workflow";

const STYLE: Record<SheetState, [icon: string, className: string]> = {
  draft: ["✎", "border-stone-400 text-stone-800"],
  in_review: ["◔", "border-amber-500 text-amber-900"],
  published: ["✓", "border-green-700 text-green-900"],
  superseded: ["↺", "border-stone-400 text-stone-600"],
  withdrawn: ["×", "border-red-700 text-red-900"],
};

/** A version state: always an icon and a word, never colour alone. */
export function StateBadge({ state }: { state: SheetState }) {
  const [icon, className] = STYLE[state];
  return (
    <span
      data-state={state}
      className={`inline-flex items-center gap-1 rounded border bg-white px-1.5 py-0.5 text-xs font-medium ${className}`}
    >
      <span aria-hidden>{icon}</span>
      {sheetStateLabels[state]}
    </span>
  );
}
