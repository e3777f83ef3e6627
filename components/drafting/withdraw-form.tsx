"use client";

import type { ActionState } from "@/lib/actions/action-state";

import { ActionForm } from "./action-form";

type Props = { action: (s: ActionState, f: FormData) => Promise<ActionState>; vendorSlug: string; slug: string; versions: number[] };

export function WithdrawForm({ action, vendorSlug, slug, versions }: Props) {
  return (
    <ActionForm action={action} hidden={{ vendor: vendorSlug, slug }} submitLabel="Withdraw" variant="danger" label="Withdraw a version">
      {(errors, sent) => (
        <>
          <label className="flex flex-col gap-1 text-sm font-medium">
            Version
            <select name="version" defaultValue={sent.values?.version} className="min-h-11 rounded border border-stone-300 bg-white px-3">
              {versions.map((n) => (
                <option key={n} value={n}>
                  Version {n}
                </option>
              ))}
            </select>
          </label>
          <label className="flex flex-col gap-1 text-sm font-medium">
            Reason (shown to readers)
            <textarea
              name="reason"
              rows={2}
              required
              minLength={5}
              defaultValue={sent.values?.reason}
              aria-invalid={errors.reason ? true : undefined}
              className="rounded border border-stone-300 p-2 font-normal"
            />
          </label>
          {errors.reason ? <p className="text-sm text-red-800">⚠ {errors.reason.join(" ")}</p> : null}
        </>
      )}
    </ActionForm>
  );
}
