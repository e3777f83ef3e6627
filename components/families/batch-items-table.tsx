import { ParameterDiffTable } from "@/components/drafting/parameter-diff-table";
import type { ActionState } from "@/lib/actions/action-state";
import type { BatchItem } from "@/lib/families/list-batch-items";

import { ExcludeForm } from "./exclude-form";

const OUTCOME: Record<string, string> = {
  created: "New sheet",
  "new-version": "New version",
  unchanged: "No change",
  blocked: "Blocked: engine warns",
  busy: "Left alone: open draft",
};

type Props = {
  items: BatchItem[];
  vendorSlug: string;
  exclude: ((s: ActionState, f: FormData) => Promise<ActionState>) | null;
  hidden: Record<string, string>;
};

/** The batch's sheets for review: each written sheet with its parameter diff, the rules behind it, and a way to leave it out. */
export function BatchItemsTable({ items, vendorSlug, exclude, hidden }: Props) {
  return (
    <ul className="flex flex-col gap-3" data-testid="batch-items">
      {items.map((item) => (
        <li
          key={item.id}
          data-item={`${item.sku}/${item.className}`}
          data-outcome={item.outcome}
          className="rounded-md border border-stone-300 bg-white p-3"
        >
          <div className="flex flex-wrap items-baseline gap-3">
            <h3 className="font-semibold">
              {item.sku} · {item.materialName} · {item.className}
            </h3>
            <span className="text-sm">{OUTCOME[item.outcome] ?? item.outcome}</span>
            {item.slug && item.versionNumber ? (
              <a className="text-sm underline" href={`/${vendorSlug}/drafting/sheets/${item.slug}`}>
                {item.previousNumber ? `v${item.previousNumber} → ` : ""}v{item.versionNumber}
              </a>
            ) : null}
            {item.excludedReason ? (
              <span className="text-sm text-red-900">
                <span aria-hidden>× </span>Left out: {item.excludedReason}
              </span>
            ) : null}
          </div>
          {item.warnings.length ? (
            <ul className="mt-1 text-sm text-red-900">
              {item.warnings.map((w) => (
                <li key={`${w.operation}-${w.code}`}>
                  <span aria-hidden>⚠ </span>
                  {w.operation}: {w.message}
                </li>
              ))}
            </ul>
          ) : null}
          {item.diff.length ? (
            <div className="mt-2">
              <ParameterDiffTable diff={item.diff} units="metric" />
            </div>
          ) : null}
          {item.provenance.length ? (
            <p className="mt-1 text-xs text-stone-600">
              Numbers from:{" "}
              {item.provenance.map((p) => `${p.label} — ${p.rules.length ? p.rules.join(", ") : "the material's own data"}`).join("; ")}
            </p>
          ) : null}
          {exclude && !item.excludedReason && (item.outcome === "created" || item.outcome === "new-version") ? (
            <ExcludeForm action={exclude} hidden={{ ...hidden, itemId: item.id }} sku={item.sku} />
          ) : null}
        </li>
      ))}
    </ul>
  );
}
