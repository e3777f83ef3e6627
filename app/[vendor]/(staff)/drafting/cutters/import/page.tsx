import { CsvImport } from "@/components/catalogue/csv-import";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { listCutters } from "@/lib/catalogue/list-catalogue";

export const metadata = { title: "Import cutters" };

export default async function ImportCuttersPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  const { vendor } = await requirePageAccess(slug, "catalogue.edit", `/${slug}/drafting/cutters/import`);
  const skus = (await listCutters({ vendorId: vendor.id })).map((c) => c.sku);
  return (
    <>
      <PageHeader title="Import cutters from CSV" lead="Check the preview, then import. The import runs in one transaction." />
      <CsvImport
        url={`/${vendor.slug}/drafting/cutters/import/run`}
        existingSkus={skus}
        cataloguePath={`/${vendor.slug}/drafting/cutters`}
      />
    </>
  );
}
