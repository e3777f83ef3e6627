import Link from "next/link";

import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { listRecentAudit } from "@/lib/audit/list-audit";

export const metadata = { title: "Admin" };

export default async function AdminPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  const { vendor } = await requirePageAccess(slug, "members.manage", `/${slug}/admin`);
  const audit = await listRecentAudit({ vendorId: vendor.id });
  return (
    <>
      <PageHeader title="Admin" lead="Run this workspace: members and roles, branding and settings." />
      <ul className="mb-8 grid gap-3 sm:grid-cols-3">
        <li className="rounded-lg border border-stone-200 bg-white p-4">
          <Link href={`/${vendor.slug}/admin/members`} className="font-medium underline">Members and roles</Link>
          <p className="mt-1 text-sm text-stone-600">Invite staff, change roles, remove people.</p>
        </li>
        <li className="rounded-lg border border-stone-200 bg-white p-4">
          <p className="font-medium">Branding</p>
          <p className="mt-1 text-sm text-stone-600">Accent colour <span className="num" style={{ color: vendor.accentColor }}>■ {vendor.accentColor}</span>{vendor.hasLogo ? ", logo set" : ", no logo"}.</p>
        </li>
        <li className="rounded-lg border border-stone-200 bg-white p-4">
          <p className="font-medium">Settings</p>
          <p className="mt-1 text-sm text-stone-600">
            Library {vendor.settings.libraryPublic ? "public" : "for signed-in customers only"}; publishing {vendor.settings.requireSecondApproval ? "needs a second engineer's approval" : "needs no second approval"}.
          </p>
        </li>
      </ul>
      <h2 className="mb-3 text-lg font-semibold">Recent activity</h2>
      <ol className="divide-y divide-stone-100 rounded-lg border border-stone-200 bg-white text-sm">
        {audit.length === 0 ? <li className="p-3 text-stone-600">Nothing yet.</li> : null}
        {audit.map((a) => (
          <li key={a.id} className="flex gap-3 p-3">
            <time className="num text-stone-500" dateTime={a.createdAt.toISOString()}>{a.createdAt.toISOString().slice(0, 16).replace("T", " ")}</time>
            <span className="num">{a.action}</span>
            <span className="text-stone-600">{a.objectType}</span>
            <span className="ml-auto text-stone-600">{a.actorEmail ?? "system"}</span>
          </li>
        ))}
      </ol>
    </>
  );
}
