import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";

export const metadata = { title: "Support" };

export default async function SupportPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  const { vendor } = await requirePageAccess(slug, "support.use", `/${slug}/support`);
  return (
    <>
      <PageHeader title="Support" lead={`Your questions to ${vendor.name}'s support team, with the sheet and machine they are about.`} />
      <EmptyState title="You have no tickets.">Questions you ask appear here with their replies.</EmptyState>
    </>
  );
}
