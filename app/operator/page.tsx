import { CreateVendorForm } from "@/components/operator/create-vendor-form";
import { DeadLetterList } from "@/components/operator/dead-letter-list";
import { PageHeader } from "@/components/ui/page-header";
import { requireOperator } from "@/lib/auth/require-operator";
import { listDeadLetters, summariseDeadLetters } from "@/lib/mail/dead-letters";
import { formatDate } from "@/lib/ui/dates";
import { listVendorsForOperator } from "@/lib/vendors/list-vendors-for-operator";

import { createVendorAction } from "./actions";
import { discardDeadLettersAction, retryDeadLettersAction } from "./dead-letter-actions";

export const metadata = { title: "Operator" };

export default async function OperatorPage() {
  await requireOperator();
  const [vendors, deadLetterSummary, deadLetters] = await Promise.all([
    listVendorsForOperator(),
    summariseDeadLetters(),
    listDeadLetters(),
  ]);
  return (
    <div>
      <PageHeader
        title="Operator"
        lead="Create vendor workspaces. Vendors' private data (sheets in draft, tickets, customers) is not shown here."
      />
      <h2 className="mb-3 text-lg font-semibold">New workspace</h2>
      <CreateVendorForm createVendorAction={createVendorAction} />
      <h2 className="mt-10 mb-3 text-lg font-semibold">Workspaces</h2>
      <table className="w-full rounded-lg border border-stone-200 bg-white text-left text-sm">
        <thead className="bg-stone-100">
          <tr>
            <th className="px-3 py-2">Name</th>
            <th className="px-3 py-2">Slug</th>
            <th className="px-3 py-2">Members</th>
            <th className="px-3 py-2">Created</th>
          </tr>
        </thead>
        <tbody>
          {vendors.map((v) => (
            <tr key={v.id} className="border-t border-stone-100">
              <td className="px-3 py-2">{v.name}</td>
              <td className="num px-3 py-2">/{v.slug}</td>
              <td className="num px-3 py-2">{v.memberCount}</td>
              <td className="num px-3 py-2">{formatDate(v.createdAt)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <h2 className="mt-10 mb-3 text-lg font-semibold">Undelivered e-mail</h2>
      <DeadLetterList summary={deadLetterSummary} letters={deadLetters} actions={{ retryDeadLettersAction, discardDeadLettersAction }} />
    </div>
  );
}
