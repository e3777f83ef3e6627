import type { Metadata } from "next";
import { notFound } from "next/navigation";

import { CachedCutterSheets } from "@/components/library/cached-library-cutter";
import { loadLibraryCutter } from "@/components/library/load-library-cutter";
import { readUnits } from "@/components/library/read-units";
import { UnitsToggle } from "@/components/library/units-toggle";
import { PageHeader } from "@/components/ui/page-header";

type Props = { params: Promise<{ vendor: string; sku: string }> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const { vendor, sku } = await params;
  return { title: (await loadLibraryCutter(vendor, sku))?.cutter.sku ?? "Cutter" };
}

// The deep-link target of a cutter's short link and QR code: the cutter and its published sheets.
export default async function CutterPage({ params }: Props) {
  const { vendor: vendorSlug, sku } = await params;
  const found = await loadLibraryCutter(vendorSlug, sku);
  if (!found) notFound();
  const { vendor, cutter } = found;
  const units = await readUnits();
  return (
    <>
      <PageHeader title={`${cutter.sku}: ${cutter.name}`} lead="Published recipe sheets for this cutter." actions={<UnitsToggle units={units} />} />
      <CachedCutterSheets vendorId={vendor.id} vendorSlug={vendor.slug} sku={cutter.sku} units={units} />
    </>
  );
}
