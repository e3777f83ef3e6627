import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";

export const metadata = { title: "Desk" };

export default async function DeskPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  await requirePageAccess(slug, "desk.use", `/${slug}/desk`);
  return (
    <>
      <PageHeader title="Desk" lead="The support queue: tickets by status, priority and response target." />
      <EmptyState title="The queue is empty.">New tickets from customers land here.</EmptyState>
    </>
  );
}
