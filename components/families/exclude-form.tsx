"use client";

import { ActionForm } from "@/components/drafting/action-form";
import type { ActionState } from "@/lib/actions/action-state";

type Props = { action: (s: ActionState, f: FormData) => Promise<ActionState>; hidden: Record<string, string>; sku: string };

/** Leave one sheet out of the batch, with the reason the author will read. */
export function ExcludeForm({ action, hidden, sku }: Props) {
  return (
    <details>
      <summary className="cursor-pointer text-sm underline">Leave out…</summary>
      <ActionForm action={action} hidden={hidden} submitLabel="Leave this sheet out" variant="danger" label={`Leave ${sku} out`}>
        {(errors, sent) => (
          <>
            <label className="flex flex-col gap-1 text-sm font-medium">
              Reason
              <input
                name="reason"
                required
                minLength={3}
                defaultValue={sent.values?.reason}
                aria-invalid={errors.reason ? true : undefined}
                className="min-h-11 rounded border border-stone-300 px-3 font-normal"
              />
            </label>
            {errors.reason ? <p className="text-sm text-red-800">⚠ {errors.reason.join(" ")}</p> : null}
          </>
        )}
      </ActionForm>
    </details>
  );
}
