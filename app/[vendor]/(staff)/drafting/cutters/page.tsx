import Link from "next/link";

import { CuttersTable } from "@/components/catalogue/catalogue-tables";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { listCutters } from "@/lib/catalogue/list-catalogue";

export const metadata = { title: "Cutters" };

export default async function CuttersPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  const { vendor } = await requirePageAccess(slug, "sheets.author", `/${slug}/drafting/cutters`);
  const cutters = await listCutters({ vendorId: vendor.id });
  const actions = (
    <>
      <Link href={`/${slug}/drafting/cutters/import`} className="min-h-11 rounded border border-stone-300 bg-white px-4 py-2 font-medium">
        Import CSV
      </Link>
      <Link href={`/${slug}/drafting/cutters/new`} className="min-h-11 rounded bg-accent px-4 py-2 font-medium text-accent-ink">
        New cutter
      </Link>
    </>
  );
  return (
    <>
      <PageHeader title="Cutters" lead="The vendor's cutters, with ISO 13399 sizes." actions={actions} />
      <CuttersTable vendorSlug={vendor.slug} cutters={cutters} />
    </>
  );
}
