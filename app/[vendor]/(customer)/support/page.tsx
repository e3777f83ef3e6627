import Link from "next/link";

import { DueBadge, formatDateTime, StatusBadge } from "@/components/support/ticket-badges";
import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { listCustomerTickets } from "@/lib/tickets/list-customer-tickets";

export const metadata = { title: "Support" };

export default async function SupportPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  const { vendor, user } = await requirePageAccess(slug, "support.use", `/${slug}/support`);
  const tickets = await listCustomerTickets({ vendorId: vendor.id, customerId: user!.id });
  const newLink = (
    <Link
      href={`/${vendor.slug}/support/new`}
      className="inline-flex min-h-11 items-center rounded bg-accent px-4 font-medium text-accent-ink"
    >
      New ticket
    </Link>
  );
  return (
    <>
      <PageHeader
        title="Support"
        lead={`Your questions to ${vendor.name}'s support team, with the sheet and machine they are about.`}
        actions={newLink}
      />
      {tickets.length === 0 ? (
        <EmptyState title="You have no tickets.">Questions you ask appear here with their replies.</EmptyState>
      ) : (
        <div className="overflow-x-auto rounded-lg border border-stone-200 bg-white">
          <table className="w-full text-left text-sm">
            <caption className="sr-only">My tickets</caption>
            <thead className="bg-stone-100 text-stone-700">
              <tr>
                <th className="px-3 py-2">#</th>
                <th className="px-3 py-2">Subject</th>
                <th className="px-3 py-2">Status</th>
                <th className="px-3 py-2">Last activity</th>
                <th className="px-3 py-2">First reply</th>
              </tr>
            </thead>
            <tbody>
              {tickets.map((t) => (
                <tr key={t.id} className="border-t border-stone-100">
                  <td className="num px-3 py-3">{t.number}</td>
                  <td className="px-3 py-3">
                    <Link href={`/${vendor.slug}/support/tickets/${t.id}`} className="font-medium underline underline-offset-2">
                      {t.subject}
                    </Link>
                  </td>
                  <td className="px-3 py-3">
                    <StatusBadge status={t.status} />
                  </td>
                  <td className="px-3 py-3">{formatDateTime(t.lastActivityAt)}</td>
                  <td className="px-3 py-3">
                    <DueBadge dueAt={t.firstResponseDueAt} respondedAt={t.firstResponseAt} overdue={false} />
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </>
  );
}
