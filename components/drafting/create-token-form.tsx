"use client";

import { useActionState } from "react";

import { Field } from "@/components/forms/field";
import { FormMessage } from "@/components/forms/form-message";
import { SubmitButton } from "@/components/forms/submit-button";
import { initialActionState, type ActionState } from "@/lib/actions/action-state";

export function CreateTokenForm({
  vendorSlug,
  action,
}: {
  vendorSlug: string;
  action: (s: ActionState, f: FormData) => Promise<ActionState>;
}) {
  const [state, formAction] = useActionState(action, initialActionState);
  const secret = state.ok ? (state.data as { secret?: string } | undefined)?.secret : undefined;
  return (
    <form action={formAction} className="flex max-w-xl flex-col gap-3">
      <input type="hidden" name="vendor" value={vendorSlug} />
      <Field
        label="Token name"
        name="name"
        errors={state.errors?.name}
        hint="What the token is for, e.g. “lab publishing script”."
        required
        minLength={2}
      />
      <div className="flex items-center gap-3">
        <SubmitButton>Create token</SubmitButton>
        <FormMessage state={state} success={state.message} />
      </div>
      {secret ? (
        <div role="status" className="rounded-md border border-green-700 bg-green-50 p-3">
          <p className="text-sm font-medium">✓ Your new token (shown only now; it is stored hashed):</p>
          <input
            readOnly
            value={secret}
            aria-label="New token"
            onFocus={(e) => e.currentTarget.select()}
            className="mt-1 w-full rounded border border-stone-300 bg-white px-2 py-2 font-mono text-sm"
            data-token
          />
          <p className="mt-1 text-xs text-stone-700">
            Send it as <code className="num">Authorization: Bearer …</code> to <code className="num">/api/v1/vendors/{vendorSlug}/…</code>.
          </p>
        </div>
      ) : null}
    </form>
  );
}
