"use client";

import Link from "next/link";

import { acceptInvitationAction } from "@/app/[vendor]/(public)/join/[token]/actions";
import { Field } from "@/components/forms/field";
import { FormMessage } from "@/components/forms/form-message";
import { SubmitButton } from "@/components/forms/submit-button";
import { useValidatedAction } from "@/components/forms/use-validated-action";
import { acceptInvitationSchema } from "@/lib/members/member-schemas";

export function AcceptInvitationForm({ vendor, token, needsPassword }: { vendor: string; token: string; needsPassword: boolean }) {
  const { state, formAction, onSubmit, errors } = useValidatedAction(acceptInvitationAction, acceptInvitationSchema);
  if (state.ok) {
    return (
      <div role="status" className="rounded-lg border border-green-300 bg-green-50 p-4">
        <p>✓ {state.message}</p>
        <Link className="mt-2 inline-block underline" href={`/sign-in?vendor=${vendor}&callbackUrl=/${vendor}`}>Sign in</Link>
      </div>
    );
  }
  return (
    <form action={formAction} onSubmit={onSubmit} noValidate className="space-y-4 rounded-lg border border-stone-200 bg-white p-5">
      <input type="hidden" name="vendor" value={vendor} />
      <input type="hidden" name="token" value={token} />
      <Field label="Your name" name="name" autoComplete="name" errors={errors.name} />
      {needsPassword ? <Field label="Choose a password" name="password" type="password" autoComplete="new-password" errors={errors.password} hint="At least 10 characters." /> : null}
      <FormMessage state={state} />
      <SubmitButton pendingText="Joining…">Accept invitation</SubmitButton>
    </form>
  );
}
