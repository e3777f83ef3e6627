import Link from "next/link";

import { BrandingForm } from "@/components/admin/branding-form";
import { PageHeader } from "@/components/ui/page-header";
import { describeAuditAction } from "@/lib/audit/action-labels";
import { listRecentAudit } from "@/lib/audit/list-audit";
import { requirePageAccess } from "@/lib/auth/page-access";
import { formatDateTime } from "@/lib/ui/dates";

import { updateBrandingAction } from "./actions";

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
          <Link href={`/${vendor.slug}/admin/members`} className="font-medium underline">
            Members and roles
          </Link>
          <p className="mt-1 text-sm text-stone-600">Invite staff, change roles, remove people.</p>
        </li>
        <li className="rounded-lg border border-stone-200 bg-white p-4">
          <Link href={`/${vendor.slug}/admin/integrations`} className="font-medium underline">
            Integrations
          </Link>
          <p className="mt-1 text-sm text-stone-600">Webhooks for your shop or ERP, and the API reference.</p>
        </li>
      </ul>
      <h2 className="mb-3 text-lg font-semibold">Branding and settings</h2>
      <div className="mb-8">
        <BrandingForm updateBrandingAction={updateBrandingAction} vendor={vendor} />
      </div>
      <h2 className="mb-3 text-lg font-semibold">Recent activity</h2>
      <ol className="divide-y divide-stone-100 rounded-lg border border-stone-200 bg-white text-sm">
        {audit.length === 0 ? <li className="p-3 text-stone-600">Nothing yet.</li> : null}
        {audit.map((a) => (
          <li key={a.id} className="flex gap-3 p-3">
            <time className="num text-stone-500" dateTime={a.createdAt.toISOString()}>
              {formatDateTime(a.createdAt)}
            </time>
            <span data-action={a.action}>{describeAuditAction(a.action, a.details)}</span>
            <span className="ml-auto text-stone-600">{a.actorEmail ?? "system"}</span>
          </li>
        ))}
      </ol>
    </>
  );
}
