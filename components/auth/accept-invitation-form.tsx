"use client";

import { signIn } from "next-auth/react";
import Link from "next/link";
import { useEffect, useRef, useState, type FormEvent } from "react";

import { Field } from "@/components/forms/field";
import { FormMessage } from "@/components/forms/form-message";
import { SubmitButton } from "@/components/forms/submit-button";
import { useValidatedAction } from "@/components/forms/use-validated-action";
import { acceptInvitationSchema } from "@/content-schema/members";
import type { ActionState, FormAction } from "@/lib/actions/action-state";

/**
 * `newAccount`: the invitation creates the account (name and password asked), then signs the person in with
 * the password just chosen. Otherwise the person is already signed in as the invited account.
 */
export function AcceptInvitationForm({
  vendor,
  token,
  newAccount,
  acceptInvitationAction,
}: {
  vendor: string;
  token: string;
  newAccount: boolean;
  acceptInvitationAction: FormAction;
}) {
  const { state, formAction, onSubmit, errors } = useValidatedAction(acceptInvitationAction, acceptInvitationSchema);
  const accepted = state as ActionState<{ email: string; created: boolean }>;
  const password = useRef("");
  const [signInFailed, setSignInFailed] = useState(false);
  const home = `/${vendor}`;

  useEffect(() => {
    if (!accepted.ok || !accepted.data) return;
    if (!accepted.data.created) return window.location.assign(home);
    void signIn("password", { email: accepted.data.email, password: password.current, redirect: false }).then((result) => {
      password.current = "";
      if (result?.ok && !result.error) window.location.assign(home);
      else setSignInFailed(true);
    });
  }, [accepted.ok, accepted.data, home]);

  if (accepted.ok) {
    return (
      <div role="status" className="rounded-lg border border-green-300 bg-green-50 p-4">
        <p>
          ✓ {accepted.message} {signInFailed ? "" : "Signing you in…"}
        </p>
        {signInFailed ? (
          <Link className="mt-2 inline-block underline" href={`/sign-in?vendor=${vendor}&callbackUrl=${home}`}>
            Sign in
          </Link>
        ) : null}
      </div>
    );
  }

  function remember(event: FormEvent<HTMLFormElement>) {
    password.current = String(new FormData(event.currentTarget).get("password") ?? "");
    onSubmit(event);
  }

  return (
    <form action={formAction} onSubmit={remember} noValidate className="space-y-4 rounded-lg border border-stone-200 bg-white p-5">
      <input type="hidden" name="vendor" value={vendor} />
      <input type="hidden" name="token" value={token} />
      {newAccount ? (
        <>
          <Field label="Your name" name="name" autoComplete="name" errors={errors.name} />
          <Field
            label="Choose a password"
            name="password"
            type="password"
            autoComplete="new-password"
            errors={errors.password}
            hint="At least 10 characters."
          />
        </>
      ) : null}
      <FormMessage state={state} />
      <SubmitButton pendingText="Joining…">Accept invitation</SubmitButton>
    </form>
  );
}
