"use client";

import { signIn } from "next-auth/react";
import Link from "next/link";
import { useState, type FormEvent } from "react";

import { Field } from "@/components/forms/field";
import { credentialsSchema, emailSchema } from "@/content-schema/auth";
import type { ActionState } from "@/lib/actions/action-state";
import type { FieldErrors } from "@/lib/errors/domain-errors";

type ResendVerification = (input: { email: string; vendor?: string }) => Promise<ActionState>;

export function SignInForms({
  callbackUrl,
  vendor,
  resendVerificationAction,
}: {
  callbackUrl: string;
  vendor?: string;
  resendVerificationAction: ResendVerification;
}) {
  const [errors, setErrors] = useState<FieldErrors>({});
  const [linkErrors, setLinkErrors] = useState<string[] | undefined>();
  const [busy, setBusy] = useState(false);
  const [unconfirmed, setUnconfirmed] = useState<string | null>(null);
  const [resent, setResent] = useState<{ ok: boolean; message?: string } | null>(null);

  async function onPassword(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const values = Object.fromEntries(new FormData(event.currentTarget).entries());
    const parsed = credentialsSchema.safeParse(values);
    if (!parsed.success) {
      const next: FieldErrors = {};
      for (const issue of parsed.error.issues) (next[String(issue.path[0])] ??= []).push(issue.message);
      setErrors(next);
      return;
    }
    setErrors({});
    setBusy(true);
    const result = await signIn("password", { ...parsed.data, redirect: false, callbackUrl });
    setBusy(false);
    // Stay on this origin: next-auth's absolute URL uses NEXTAUTH_URL, which may name another host alias.
    if (result?.ok && !result.error) return window.location.assign(callbackUrl);
    if (result?.error === "email_unverified") {
      setUnconfirmed(parsed.data.email);
      setResent(null);
      return setErrors({ _form: [`Confirm your e-mail first: open the link we sent to ${parsed.data.email}, then sign in.`] });
    }
    setUnconfirmed(null);
    setErrors({
      _form: [result?.error === "rate_limited" ? "Too many attempts. Wait 15 minutes and try again." : "E-mail or password is not right."],
    });
  }

  async function onResend() {
    if (!unconfirmed) return;
    setResent(await resendVerificationAction({ email: unconfirmed, vendor }));
  }

  async function onMagicLink(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const email = emailSchema.safeParse(new FormData(event.currentTarget).get("email"));
    if (!email.success) return setLinkErrors(email.error.issues.map((i) => i.message));
    setLinkErrors(undefined);
    await signIn("email", { email: email.data, callbackUrl });
  }

  return (
    <div className="mt-6 space-y-8">
      <form
        onSubmit={onPassword}
        noValidate
        className="space-y-4 rounded-lg border border-stone-200 bg-white p-5"
        aria-labelledby="pw-title"
      >
        <h2 id="pw-title" className="font-medium">
          With your password
        </h2>
        <Field label="E-mail" name="email" type="email" autoComplete="email" errors={errors.email} id="pw-email" />
        <Field label="Password" name="password" type="password" autoComplete="current-password" errors={errors.password} id="pw-password" />
        {errors._form ? (
          <p role="alert" className="text-sm text-red-800">
            ⚠ {errors._form.join(" ")}
          </p>
        ) : null}
        {unconfirmed ? (
          <div className="space-y-2">
            <button
              type="button"
              onClick={onResend}
              className="min-h-11 rounded border border-stone-400 bg-white px-4 py-2 text-sm font-medium"
            >
              Send the link again
            </button>
            {resent ? (
              <p role={resent.ok ? "status" : "alert"} className="text-sm">
                {resent.ok ? "✓" : "⚠"} {resent.message}
              </p>
            ) : null}
          </div>
        ) : null}
        <button
          type="submit"
          disabled={busy}
          className="min-h-11 w-full rounded bg-stone-900 px-4 py-2 font-medium text-white disabled:opacity-60"
        >
          {busy ? "Signing in…" : "Sign in"}
        </button>
      </form>
      <form
        onSubmit={onMagicLink}
        noValidate
        className="space-y-4 rounded-lg border border-stone-200 bg-white p-5"
        aria-labelledby="ml-title"
      >
        <h2 id="ml-title" className="font-medium">
          With a link by e-mail
        </h2>
        <p className="text-sm text-stone-700">Forgot your password? Sign in with a link, then set a new one under Your account.</p>
        <Field label="E-mail" name="email" type="email" autoComplete="email" errors={linkErrors} id="ml-email" />
        <button type="submit" className="min-h-11 w-full rounded border border-stone-400 bg-white px-4 py-2 font-medium">
          E-mail me a sign-in link
        </button>
      </form>
      {vendor ? (
        <p className="text-sm text-stone-700">
          New here?{" "}
          <Link className="underline" href={`/${vendor}/sign-up`}>
            Create a customer account
          </Link>
          .
        </p>
      ) : null}
    </div>
  );
}
