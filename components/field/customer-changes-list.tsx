import Link from "next/link";

import { EmptyState } from "@/components/ui/empty-state";
import type { ChangeItem } from "@/lib/field/customer-changes";
import { describeChange } from "@/lib/field/describe-change";

export function CustomerChangesList({ items, vendorSlug, showSheet = true }: { items: ChangeItem[]; vendorSlug: string; showSheet?: boolean }) {
  if (!items.length) return <EmptyState title="No changes reported">No “worked after changes” report names a changed number yet.</EmptyState>;
  return (
    <ul className="divide-y divide-stone-200 rounded-md border border-stone-300 bg-white text-sm" data-testid="customer-changes">
      {items.map((c) => (
        <li key={`${c.versionId}:${c.param}`} className="px-4 py-3">
          {showSheet ? (
            <Link className="font-medium underline" href={`/${vendorSlug}/drafting/field/${c.sheetSlug}`}>{c.title}</Link>
          ) : (
            <span className="font-medium">Version {c.number}</span>
          )}
          {showSheet ? <span className="ml-2 text-stone-600"><span className="num">v{c.number}</span> · {c.machineClass}</span> : null}
          <p className="mt-1">{describeChange(c)}.</p>
        </li>
      ))}
    </ul>
  );
}
