import Link from "next/link";

import { ActionForm } from "@/components/drafting/action-form";
import type { FormAction } from "@/lib/actions/action-state";

type Props = {
  vendorSlug: string;
  sku: string;
  cutterId: string;
  state: "signed-out" | "not-member" | "mine" | "not-mine";
  addMyCutterAction: FormAction;
  removeMyCutterAction: FormAction;
};

/** On a cutter's page (where its box's QR code leads): add it to my cutters, or sign in to do so. */
export function MyCutterButton({ vendorSlug, sku, cutterId, state, addMyCutterAction, removeMyCutterAction }: Props) {
  if (state === "not-member") return null;
  if (state === "signed-out") {
    const back = `/${vendorSlug}/library/cutters/${encodeURIComponent(sku)}`;
    return (
      <Link
        href={`/sign-in?vendor=${vendorSlug}&callbackUrl=${encodeURIComponent(back)}`}
        className="inline-flex min-h-11 items-center rounded border border-stone-300 bg-white px-4 text-sm font-medium"
      >
        Sign in to add it to my cutters
      </Link>
    );
  }
  if (state === "mine") {
    return (
      <div className="flex flex-wrap items-center gap-3 text-sm">
        <span>✓ In my cutters</span>
        <ActionForm
          action={removeMyCutterAction}
          hidden={{ vendor: vendorSlug, cutterId }}
          submitLabel="Remove from my cutters"
          variant="quiet"
        />
      </div>
    );
  }
  return <ActionForm action={addMyCutterAction} hidden={{ vendor: vendorSlug, sku }} submitLabel="Add to my cutters" />;
}
