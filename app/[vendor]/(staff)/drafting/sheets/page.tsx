import Link from "next/link";

import { SheetsTable } from "@/components/drafting/sheets-table";
import { PageHeader } from "@/components/ui/page-header";
import { requirePageAccess } from "@/lib/auth/page-access";
import { listDraftingSheets } from "@/lib/sheets/list-drafting-sheets";

export const metadata = { title: "Sheets" };

export default async function SheetsPage({ params }: { params: Promise<{ vendor: string }> }) {
  const { vendor: slug } = await params;
  const { vendor } = await requirePageAccess(slug, "sheets.author", `/${slug}/drafting/sheets`);
  const sheets = await listDraftingSheets({ vendorId: vendor.id });
  const actions = (
    <Link href={`/${slug}/drafting/sheets/new`} className="min-h-11 rounded bg-accent px-4 py-2 font-medium text-accent-ink">
      New sheet
    </Link>
  );
  return (
    <>
      <PageHeader title="Sheets" lead="Every recipe sheet with its latest version." actions={actions} />
      <SheetsTable vendorSlug={vendor.slug} sheets={sheets} />
    </>
  );
}
