import { InviteMemberForm } from "@/components/admin/invite-member-form";
import { MemberRowActions } from "@/components/admin/member-row-actions";
import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { ROLE_LABELS } from "@/lib/auth/roles";
import { listMembers, listPendingInvitations } from "@/lib/members/list-members";
import { formatDate } from "@/lib/ui/dates";

import { changeRoleAction, inviteMemberAction, removeMemberAction } from "./actions";

export const metadata = { title: "Members" };

export default async function MembersPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  const { vendor, user } = await requirePageAccess(slug, "members.manage", `/${slug}/admin/members`);
  const [members, invitations] = await Promise.all([listMembers({ vendorId: vendor.id }), listPendingInvitations({ vendorId: vendor.id })]);
  return (
    <>
      <PageHeader
        title="Members"
        lead="Staff and customers of this workspace. Staff join by invitation; customers sign up on your portal."
      />
      <section aria-labelledby="invite" className="mb-8">
        <h2 id="invite" className="mb-3 text-lg font-semibold">
          Invite staff
        </h2>
        <InviteMemberForm inviteMemberAction={inviteMemberAction} vendor={vendor.slug} />
        {invitations.length > 0 ? (
          <ul className="mt-3 text-sm text-stone-700" aria-label="Pending invitations">
            {invitations.map((inv) => (
              <li key={inv.id}>
                Pending: <span className="num">{inv.email}</span> as {ROLE_LABELS[inv.role]}, expires {formatDate(inv.expiresAt)}
              </li>
            ))}
          </ul>
        ) : null}
      </section>
      <section aria-labelledby="members">
        <h2 id="members" className="mb-3 text-lg font-semibold">
          Members <span className="num text-stone-500">({members.length})</span>
        </h2>
        {members.length === 0 ? (
          <EmptyState title="No members yet." />
        ) : (
          <div className="overflow-x-auto rounded-lg border border-stone-200 bg-white">
            <table className="w-full text-left text-sm">
              <thead className="bg-stone-100 text-stone-700">
                <tr>
                  <th className="px-3 py-2">Name</th>
                  <th className="px-3 py-2">E-mail</th>
                  <th className="px-3 py-2">Role</th>
                  <th className="px-3 py-2">Since</th>
                  <th className="px-3 py-2">Change</th>
                </tr>
              </thead>
              <tbody>
                {members.map((m) => (
                  <tr key={m.id} className="border-t border-stone-100" data-member-email={m.email}>
                    <td className="px-3 py-2">
                      {m.name || "—"}
                      {m.userId === user?.id ? " (you)" : ""}
                    </td>
                    <td className="num px-3 py-2">{m.email}</td>
                    <td className="px-3 py-2">{ROLE_LABELS[m.role]}</td>
                    <td className="px-3 py-2">{formatDate(m.createdAt)}</td>
                    <td className="px-3 py-2">
                      <MemberRowActions
                        changeRoleAction={changeRoleAction}
                        removeMemberAction={removeMemberAction}
                        vendor={vendor.slug}
                        memberId={m.id}
                        role={m.role}
                        label={m.name || m.email}
                      />
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </section>
    </>
  );
}
