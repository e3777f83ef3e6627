import Link from "next/link";

import { ActionForm } from "@/components/drafting/action-form";
import { EmptyState } from "@/components/ui/empty-state";
import type { ActionState } from "@/lib/actions/action-state";
import type { ChangeItem } from "@/lib/field/customer-changes";
import { describeChange } from "@/lib/field/describe-change";

type StartDraft = (state: ActionState, form: FormData) => Promise<ActionState>;

// A suggestion can become a draft when it is on the published version and the median actually moves the number.
const draftable = (c: ChangeItem) => c.state === "published" && Math.abs(c.medianPct) >= 0.05;

export function CustomerChangesList({
  items,
  vendorSlug,
  showSheet = true,
  startDraft,
}: {
  items: ChangeItem[];
  vendorSlug: string;
  showSheet?: boolean;
  startDraft?: StartDraft;
}) {
  if (!items.length)
    return <EmptyState title="No changes reported">No “worked after changes” report names a changed number yet.</EmptyState>;
  return (
    <ul className="divide-y divide-stone-200 rounded-md border border-stone-300 bg-white text-sm" data-testid="customer-changes">
      {items.map((c) => (
        <li
          key={`${c.versionId}:${c.operationIndex}:${c.param}`}
          className="flex flex-wrap items-start justify-between gap-3 px-4 py-3"
          data-param={c.param}
          data-operation={c.operationIndex}
        >
          <div>
            {showSheet ? (
              <Link className="font-medium underline" href={`/${vendorSlug}/drafting/field/${c.sheetSlug}`}>
                {c.title}
              </Link>
            ) : (
              <span className="font-medium">Version {c.number}</span>
            )}
            {showSheet ? (
              <span className="ml-2 text-stone-600">
                <span className="num">v{c.number}</span> · {c.machineClass}
              </span>
            ) : null}
            <p className="mt-1">
              <span className="text-stone-600">{c.operationLabel}:</span> {describeChange(c)}.
            </p>
          </div>
          {startDraft && draftable(c) ? (
            <ActionForm
              action={startDraft}
              hidden={{ vendor: vendorSlug, versionId: c.versionId, operationIndex: String(c.operationIndex), param: c.param }}
              submitLabel="Start a draft from this"
              variant="quiet"
              label={`Start a draft of ${c.title} from this change`}
            />
          ) : null}
        </li>
      ))}
    </ul>
  );
}
