import Link from "next/link";

import { EmptyState } from "@/components/ui/empty-state";
import { formatLength, type UnitSystem } from "@/lib/machining";
import type { PublishedSheetSummary } from "@/lib/sheets/list-published-sheets";
import { distinctTitles } from "@/lib/ui/distinct-titles";

export function SheetCards({
  sheets,
  vendorSlug,
  units,
  empty,
}: {
  sheets: PublishedSheetSummary[];
  vendorSlug: string;
  units: UnitSystem;
  empty: string;
}) {
  if (sheets.length === 0) return <EmptyState title={empty}>Try another cutter, material or machine class.</EmptyState>;
  const titles = distinctTitles(
    sheets,
    (s) => s.title,
    (s) => s.machineClassName,
  );
  return (
    <ul className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
      {sheets.map((sheet, i) => (
        <li key={sheet.slug} className="rounded-lg border border-stone-200 bg-white p-4 shadow-sm">
          <Link href={`/${vendorSlug}/library/${sheet.slug}`} className="font-medium hover:underline">
            {titles[i]}
          </Link>
          <p className="mt-1 text-sm text-stone-600">
            <span className="num">{sheet.cutterSku}</span> · Ø <span className="num">{formatLength(sheet.diameterMm, units)}</span> ·{" "}
            <span className="num">{sheet.flutes}</span> {sheet.flutes === 1 ? "flute" : "flutes"}
          </p>
          <p className="text-sm text-stone-600">
            {sheet.materialName} · {sheet.machineClassName}
          </p>
          <p className="mt-1 text-xs text-stone-500">
            Version <span className="num">{sheet.number}</span>
          </p>
        </li>
      ))}
    </ul>
  );
}
