import Link from "next/link";

import { QueueTable } from "@/components/desk/queue-table";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { listAssignees, listMaterialOptions } from "@/lib/desk/desk-options";
import { listQueuePage } from "@/lib/desk/list-queue";
import { parseQueueFilters } from "@/lib/desk/queue-filters";
import { parseQueuePage } from "@/lib/desk/queue-page";
import { listDeskViews } from "@/lib/desk/saved-views";

import { bulkAssignAction, saveViewAction } from "./actions";

export const metadata = { title: "Desk" };

type Props = { params: Promise<{ vendor: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function DeskPage({ params, searchParams }: Props) {
  const { vendor: slug } = await params;
  const { vendor, user } = await requirePageAccess(slug, "desk.use", `/${slug}/desk`);
  const query = await searchParams;
  const filters = parseQueueFilters(query);
  const [tickets, views, assignees, materials] = await Promise.all([
    listQueuePage({ vendorId: vendor.id, userId: user!.id, filters, page: parseQueuePage(query.page) }),
    listDeskViews({ vendorId: vendor.id, userId: user!.id }),
    listAssignees({ vendorId: vendor.id }),
    listMaterialOptions({ vendorId: vendor.id }),
  ]);
  const dashboard = (
    <Link
      href={`/${vendor.slug}/desk/dashboard`}
      className="inline-flex min-h-9 items-center rounded border border-stone-300 bg-white px-3 text-sm"
    >
      Dashboard
    </Link>
  );
  return (
    <>
      <PageHeader
        title="Desk"
        lead="The support queue: tickets by status, priority and response target. It refreshes on its own."
        actions={dashboard}
      />
      <QueueTable
        bulkAssignAction={bulkAssignAction}
        saveViewAction={saveViewAction}
        vendor={vendor.slug}
        initial={tickets}
        initialFilters={filters}
        views={views}
        assignees={assignees}
        materials={materials}
      />
    </>
  );
}
