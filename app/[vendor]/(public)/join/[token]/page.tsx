import { notFound } from "next/navigation";

import { AcceptInvitationForm } from "@/components/auth/accept-invitation-form";
import { ROLE_LABELS } from "@/lib/auth/roles";
import { userExists } from "@/lib/users/user-exists";
import { DomainError } from "@/lib/errors/domain-errors";
import { findOpenInvitation } from "@/lib/members/accept-invitation";
import { getVendorBySlug } from "@/lib/vendors/get-vendor";

export const metadata = { title: "Accept invitation" };

export default async function JoinPage({ params }: { params: Promise<{ vendor: string; token: string }> }) {
  const { vendor: slug, token } = await params;
  const vendor = await getVendorBySlug(slug);
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
  const existing = await userExists(invitation.email);
  return (
    <div className="mx-auto max-w-md">
      <h1 className="text-2xl font-semibold">Join {vendor.name}</h1>
      <p className="mt-2 text-stone-700">
        You are invited as {ROLE_LABELS[invitation.role]} with <span className="num">{invitation.email}</span>.
      </p>
      <div className="mt-6"><AcceptInvitationForm vendor={vendor.slug} token={token} needsPassword={!existing} /></div>
    </div>
  );
}
