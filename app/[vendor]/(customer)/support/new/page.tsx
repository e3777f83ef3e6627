import { randomUUID } from "node:crypto";

import { createTicketAction } from "@/app/[vendor]/(customer)/support/actions";
import { NewTicketForm } from "@/components/support/new-ticket-form";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { listTicketFormOptions } from "@/lib/tickets/list-form-options";
import { prefillLinks } from "@/lib/tickets/prefill-links";

export const metadata = { title: "New ticket" };

type Props = { params: Promise<{ vendor: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

const first = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

export default async function NewTicketPage({ params, searchParams }: Props) {
  const { vendor: slug } = await params;
  const query = await searchParams;
  const { vendor, user } = await requirePageAccess(slug, "support.use", `/${slug}/support/new`);
  const [options, prefill] = await Promise.all([
    listTicketFormOptions({ vendorId: vendor.id, customerId: user!.id }),
    prefillLinks({ vendorId: vendor.id, customerId: user!.id, sheetVersion: first(query.sheetVersion), machine: first(query.machine) }),
  ]);
  return (
    <>
      <PageHeader
        title="New ticket"
        lead="Ask the support team. Say which cutter, material and machine, and add photos of the chips and the finish."
      />
      <NewTicketForm
        createTicketAction={createTicketAction}
        vendor={vendor.slug}
        idempotencyKey={randomUUID()}
        materials={options.materials}
        machines={options.machines}
        sheetVersion={prefill.sheetVersion}
        machineId={prefill.machine?.id}
      />
    </>
  );
}
