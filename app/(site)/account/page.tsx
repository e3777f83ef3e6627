import Link from "next/link";
import { redirect } from "next/navigation";

import { ChangePasswordForm } from "@/components/auth/change-password-form";
import { SubmitButton } from "@/components/forms/submit-button";
import { PageHeader } from "@/components/ui/page-header";
import { findSessionUser } from "@/lib/auth/session-user";
import { getAccount } from "@/lib/users/get-account";

import { changePasswordAction, endAllSessionsAction } from "./actions";

export const metadata = { title: "Your account", robots: { index: false } };

export default async function AccountPage() {
  const user = await findSessionUser();
  if (!user) redirect("/sign-in?callbackUrl=/account");
  const account = await getAccount(user.id);
  return (
    <>
      <PageHeader
        title="Your account"
        lead={
          <>
            {account.name} · <span className="num">{account.email}</span>
          </>
        }
      />
      <div className="grid gap-8 md:grid-cols-2">
        <section aria-labelledby="password-heading" className="space-y-3">
          <h2 id="password-heading" className="text-lg font-semibold">
            {account.hasPassword ? "Change your password" : "Set a password"}
          </h2>
          {account.hasPassword ? null : (
            <p className="text-sm text-stone-700">
              You sign in with a link by e-mail. A password lets you sign in without waiting for mail.
            </p>
          )}
          <ChangePasswordForm email={account.email} hasPassword={account.hasPassword} changePasswordAction={changePasswordAction} />
        </section>
        <section aria-labelledby="vendors-heading" className="space-y-3">
          <h2 id="vendors-heading" className="text-lg font-semibold">
            Your vendors
          </h2>
          {account.memberships.length ? (
            <ul className="divide-y divide-stone-200 rounded-lg border border-stone-200 bg-white">
              {account.memberships.map((m) => (
                <li key={m.vendorSlug} className="flex flex-wrap items-baseline justify-between gap-2 px-4 py-3">
                  <span>
                    <Link href={`/${m.vendorSlug}/library`} className="font-medium underline">
                      {m.vendorName}
                    </Link>{" "}
                    <span className="text-sm text-stone-600">· {m.roleLabel}</span>
                  </span>
                  <Link href={`/${m.vendorSlug}/mail-preferences`} className="text-sm underline">
                    Mail preferences
                  </Link>
                </li>
              ))}
            </ul>
          ) : (
            <p className="text-sm text-stone-700">
              You belong to no vendor yet. A vendor’s Library has a link to create a customer account.
            </p>
          )}
          <h2 className="pt-4 text-lg font-semibold">Signed in elsewhere?</h2>
          <p className="text-sm text-stone-700">Ends every session of yours, on every device, this one too.</p>
          <form action={endAllSessionsAction}>
            <SubmitButton variant="danger" pendingText="Signing out…">
              Sign out everywhere
            </SubmitButton>
          </form>
        </section>
      </div>
    </>
  );
}
