import Link from "next/link";

import { confirmEmailAction } from "./actions";

export const metadata = { title: "Confirm your e-mail" };

type Search = Promise<{ token?: string; vendor?: string; done?: string; failed?: string; wrong?: string }>;
const SLUG = /^[a-z0-9-]{1,60}$/;

export default async function VerifyEmailPage({ searchParams }: { searchParams: Search }) {
  const { token, vendor: rawVendor, done, failed, wrong } = await searchParams;
  const vendor = rawVendor && SLUG.test(rawVendor) ? rawVendor : undefined;
  const signIn = vendor ? `/sign-in?vendor=${vendor}&callbackUrl=/${vendor}/bench` : "/sign-in";
  return (
    <div className="mx-auto max-w-md">
      <h1 className="text-2xl font-semibold">Confirm your e-mail</h1>
      {done ? (
        <div role="status" className="mt-4 rounded-lg border border-green-300 bg-green-50 p-4">
          <p>✓ Your e-mail is confirmed. You can sign in with your password now.</p>
          <Link className="mt-2 inline-block underline" href={signIn}>
            Sign in
          </Link>
        </div>
      ) : failed || !token ? (
        <div role="alert" className="mt-4 rounded border border-red-300 bg-red-50 p-3 text-red-900">
          <p>⚠ This confirmation link is not valid or has expired. Sign in with your password to have a new one sent.</p>
          <Link className="mt-2 inline-block underline" href={signIn}>
            Sign in
          </Link>
        </div>
      ) : (
        <form action={confirmEmailAction} className="mt-6 space-y-4 rounded-lg border border-stone-200 bg-white p-5">
          <input type="hidden" name="token" value={token} />
          {vendor ? <input type="hidden" name="vendor" value={vendor} /> : null}
          <p className="text-stone-700">
            Enter the password you chose when you created the account. If you did not create a Swarfbook account yourself, do not confirm:
            close this page, and the account stays unusable.
          </p>
          {wrong ? (
            <p role="alert" className="rounded border border-red-300 bg-red-50 p-3 text-red-900">
              ⚠ That is not the password this account was created with.
            </p>
          ) : null}
          <label className="block">
            <span className="text-sm font-medium">Password</span>
            <input
              name="password"
              type="password"
              required
              autoComplete="current-password"
              className="mt-1 block min-h-11 w-full rounded border border-stone-300 px-3 py-2"
            />
          </label>
          <button type="submit" className="min-h-11 w-full rounded bg-stone-900 px-4 py-2 font-medium text-white">
            Confirm my e-mail
          </button>
        </form>
      )}
    </div>
  );
}
