"use client";

import Link from "next/link";

import { Field } from "@/components/forms/field";
import { FormMessage } from "@/components/forms/form-message";
import { SubmitButton } from "@/components/forms/submit-button";
import { useValidatedAction } from "@/components/forms/use-validated-action";
import { changePasswordSchema } from "@/content-schema/auth";
import type { FormAction } from "@/lib/actions/action-state";

type Props = { email: string; hasPassword: boolean; changePasswordAction: FormAction };

/** Current password (when the account has one), the new one twice; on success every session ends. */
export function ChangePasswordForm({ email, hasPassword, changePasswordAction }: Props) {
  const { state, formAction, onSubmit, errors } = useValidatedAction(changePasswordAction, changePasswordSchema);
  if (state.ok) {
    return (
      <div role="status" className="rounded-lg border border-green-300 bg-green-50 p-4">
        <p>✓ {state.message}</p>
        <Link className="mt-2 inline-block underline" href="/sign-in?callbackUrl=/account">
          Sign in
        </Link>
      </div>
    );
  }
  return (
    <form action={formAction} onSubmit={onSubmit} noValidate className="space-y-4 rounded-lg border border-stone-200 bg-white p-5">
      {/* Lets a password manager file the new password under the right account. */}
      <input type="email" name="username" value={email} autoComplete="username" readOnly hidden />
      {hasPassword ? (
        <Field
          label="Current password"
          name="currentPassword"
          type="password"
          autoComplete="current-password"
          errors={errors.currentPassword}
        />
      ) : (
        <input type="hidden" name="currentPassword" value="" />
      )}
      <Field
        label="New password"
        name="newPassword"
        type="password"
        autoComplete="new-password"
        errors={errors.newPassword}
        hint="At least 10 characters."
      />
      <Field label="New password again" name="repeatPassword" type="password" autoComplete="new-password" errors={errors.repeatPassword} />
      <FormMessage state={state} />
      <SubmitButton pendingText="Changing…">{hasPassword ? "Change password" : "Set a password"}</SubmitButton>
    </form>
  );
}
