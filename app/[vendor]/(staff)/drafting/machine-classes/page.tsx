import Link from "next/link";

import { MachineClassesTable } from "@/components/catalogue/catalogue-tables";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { listMachineClasses } from "@/lib/catalogue/list-catalogue";

export const metadata = { title: "Machine classes" };

export default async function ListPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  const { vendor } = await requirePageAccess(slug, "sheets.author", `/${slug}/drafting/machine-classes`);
  const items = await listMachineClasses({ vendorId: vendor.id });
  const actions = (
    <Link href={`/${slug}/drafting/machine-classes/new`} className="min-h-11 rounded bg-accent px-4 py-2 font-medium text-accent-ink">
      New
    </Link>
  );
  return (
    <>
      <PageHeader title="Machine classes" lead="Reference machine categories the sheets are written for." actions={actions} />
      <MachineClassesTable vendorSlug={vendor.slug} machineClasses={items} />
    </>
  );
}
