"use client";

import Link from "next/link";

import { Field } from "@/components/forms/field";
import { FormMessage } from "@/components/forms/form-message";
import { SubmitButton } from "@/components/forms/submit-button";
import { useValidatedAction } from "@/components/forms/use-validated-action";
import { signUpSchema } from "@/content-schema/auth";
import type { FormAction } from "@/lib/actions/action-state";

export function SignUpForm({ vendor, signUpAction }: { vendor: string; signUpAction: FormAction }) {
  const { state, formAction, onSubmit, errors } = useValidatedAction(signUpAction, signUpSchema);
  if (state.ok) {
    return (
      <div role="status" className="rounded-lg border border-green-300 bg-green-50 p-4">
        <p>✓ {state.message}</p>
        <Link className="mt-2 inline-block underline" href={`/sign-in?vendor=${vendor}&callbackUrl=/${vendor}/bench`}>
          Sign in
        </Link>
      </div>
    );
  }
  return (
    <form action={formAction} onSubmit={onSubmit} noValidate className="space-y-4 rounded-lg border border-stone-200 bg-white p-5">
      <input type="hidden" name="vendor" value={vendor} />
      <Field label="Your name" name="name" autoComplete="name" errors={errors.name} defaultValue={state.values?.name} />
      <Field label="E-mail" name="email" type="email" autoComplete="email" errors={errors.email} defaultValue={state.values?.email} />
      <Field
        label="Password"
        name="password"
        type="password"
        autoComplete="new-password"
        errors={errors.password}
        hint="At least 10 characters."
      />
      <FormMessage state={state} />
      <SubmitButton pendingText="Creating…">Create account</SubmitButton>
    </form>
  );
}
