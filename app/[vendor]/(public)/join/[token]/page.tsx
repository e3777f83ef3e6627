import Link from "next/link";
import { notFound } from "next/navigation";

import { AcceptInvitationForm } from "@/components/auth/accept-invitation-form";
import { ROLE_LABELS } from "@/lib/auth/roles";
import { findSessionUser } from "@/lib/auth/session-user";
import { DomainError } from "@/lib/errors/domain-errors";
import { findOpenInvitation } from "@/lib/members/accept-invitation";
import { findConfirmedAccount } from "@/lib/users/find-confirmed-account";
import { findVendorBySlug } from "@/lib/vendors/get-vendor";

import { acceptInvitationAction } from "./actions";

export const metadata = { title: "Accept invitation" };

export default async function JoinPage({ params }: { params: Promise<{ vendor: string; token: string }> }) {
  const { vendor: slug, token } = await params;
  const vendor = await findVendorBySlug(slug);
  if (!vendor) notFound();
  const invitation = await findOpenInvitation({ vendorId: vendor.id, token }).catch((error: unknown) => {
    if (error instanceof DomainError) return null;
    throw error;
  });
  if (!invitation) {
    return (
      <div className="mx-auto max-w-md">
        <h1 className="text-2xl font-semibold">This invitation is not valid</h1>
        <p className="mt-2 text-stone-700">It was used already, revoked, or it expired. Ask your admin for a new one.</p>
      </div>
    );
  }
  const [accountId, user] = await Promise.all([findConfirmedAccount(invitation.email), findSessionUser()]);
  // An existing account joins only while signed in as itself, so nobody can collect a role meant for its owner.
  const mustSignIn = accountId !== null && user?.id !== accountId;
  const signInHref = `/sign-in?vendor=${vendor.slug}&callbackUrl=${encodeURIComponent(`/${vendor.slug}/join/${token}`)}`;
  return (
    <div className="mx-auto max-w-md">
      <h1 className="text-2xl font-semibold">Join {vendor.name}</h1>
      <p className="mt-2 text-stone-700">
        You are invited as {ROLE_LABELS[invitation.role]} with <span className="num">{invitation.email}</span>.
      </p>
      <div className="mt-6">
        {mustSignIn ? (
          <div className="space-y-3 rounded-lg border border-stone-200 bg-white p-5">
            <p>
              There is already a Swarfbook account for <span className="num">{invitation.email}</span>. Sign in as it to accept; you come
              back here afterwards.
            </p>
            {user ? (
              <p className="text-sm text-stone-700">
                You are signed in as <span className="num">{user.email}</span>, another account.
              </p>
            ) : null}
            <Link href={signInHref} className="inline-block min-h-11 rounded bg-accent px-4 py-2 font-medium text-accent-ink">
              Sign in to accept
            </Link>
          </div>
        ) : (
          <AcceptInvitationForm
            acceptInvitationAction={acceptInvitationAction}
            vendor={vendor.slug}
            token={token}
            newAccount={accountId === null}
          />
        )}
      </div>
    </div>
  );
}
