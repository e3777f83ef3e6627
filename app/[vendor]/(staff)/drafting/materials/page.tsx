import Link from "next/link";

import { MaterialsTable } from "@/components/catalogue/catalogue-tables";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { listMaterials } from "@/lib/catalogue/list-catalogue";

export const metadata = { title: "Materials" };

export default async function ListPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  const { vendor } = await requirePageAccess(slug, "sheets.author", `/${slug}/drafting/materials`);
  const items = await listMaterials({ vendorId: vendor.id });
  const actions = (
    <Link href={`/${slug}/drafting/materials/new`} className="min-h-11 rounded bg-accent px-4 py-2 font-medium text-accent-ink">
      New
    </Link>
  );
  return (
    <>
      <PageHeader
        title="Materials"
        lead="Workpiece materials with their cutting speed window, minimum chip load, kc and cautions."
        actions={actions}
      />
      <MaterialsTable vendorSlug={vendor.slug} materials={items} />
    </>
  );
}
