"use client";

import { useActionState } from "react";

import { FormMessage } from "@/components/forms/form-message";
import { IdempotencyKeyField } from "@/components/forms/idempotency-key-field";
import { SubmitButton } from "@/components/forms/submit-button";
import { initialActionState, type FormAction } from "@/lib/actions/action-state";

/** Hand a recipe problem to engineering: stored against the sheet version, shown in Drafting. */
export function HandoffForm({
  vendor,
  ticketId,
  versions,
  handoffAction,
}: {
  vendor: string;
  ticketId: string;
  versions: { id: string; name: string }[];
  handoffAction: FormAction;
}) {
  const [state, action] = useActionState(handoffAction, initialActionState);
  if (!versions.length) return <p className="text-sm text-stone-600">Link or embed a sheet version to hand a problem to engineering.</p>;
  return (
    <form action={action} className="space-y-2 text-sm" aria-label="Hand off to engineering">
      <input type="hidden" name="vendor" value={vendor} />
      <input type="hidden" name="ticketId" value={ticketId} />
      <IdempotencyKeyField renewOn={state.ok ? state : null} />
      <label className="block">
        Sheet version
        <select name="sheetVersionId" className="min-h-9 w-full rounded border border-stone-300 bg-white px-2">
          {versions.map((v) => (
            <option key={v.id} value={v.id}>
              {v.name}
            </option>
          ))}
        </select>
      </label>
      <label className="block">
        What is wrong
        <input
          name="summary"
          required
          className="min-h-9 w-full rounded border border-stone-300 bg-white px-2"
          placeholder="e.g. vf too low: melts on light routers"
        />
      </label>
      <label className="block">
        Details
        <textarea name="details" rows={3} className="w-full rounded border border-stone-300 bg-white px-2" />
      </label>
      <FormMessage state={state} success={state.message} />
      <SubmitButton variant="quiet">Hand off to engineering</SubmitButton>
    </form>
  );
}
