import type { Metadata } from "next";
import { notFound } from "next/navigation";

import { saveSetupAction } from "@/app/[vendor]/(customer)/bench/actions";
import { adaptPanelRenderer } from "@/components/adapt/library-adapt-panel-mount";
import { CachedSheetView } from "@/components/library/cached-sheet-view";
import { findLibrarySheetPage, parseVersionNumber } from "@/components/library/find-library-sheet-page";
import { readUnits } from "@/components/library/read-units";
import { countSheetView } from "@/lib/field/count-sheet-view";
import { noteStoredRender } from "@/lib/library/note-stored-render";

type Props = { params: Promise<{ vendor: string; sheet: string; n: string }> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const { vendor, sheet, n } = await params;
  const found = await findLibrarySheetPage(vendor, sheet, parseVersionNumber(n) ?? -1);
  return { title: found ? `${found.data.version.title} (version ${found.data.version.number})` : "Sheet" };
}

export default async function SheetVersionPage({ params }: Props) {
  const { vendor, sheet, n } = await params;
  const number = parseVersionNumber(n);
  const found = number === null ? null : await findLibrarySheetPage(vendor, sheet, number);
  if (!found) notFound();
  // Counted in memory and written in batches: a view costs the reader no database round trip. A rendering for
  // the Library page store (lib/library/page-store-proxy.ts) is no view: the store counts each page it serves.
  const [vendorId, versionId] = [found.vendor.id, found.data.version.id];
  const countView = () => countSheetView(vendorId, versionId);
  if (!(await noteStoredRender({ vendorId, versionId, onServe: countView }))) countView();
  const units = await readUnits();
  const renderAdaptPanel = adaptPanelRenderer({
    saveSetupAction,
    vendor: found.vendor,
    versionId: found.data.version.id,
    generation: found.generation,
    units,
    returnTo: `/${found.vendor.slug}/library/${found.data.sheet.slug}/v/${found.data.version.number}`,
  });
  return (
    <CachedSheetView
      vendorId={found.vendor.id}
      data={found.data}
      generation={found.generation}
      units={units}
      vendorSlug={found.vendor.slug}
      vendorName={found.vendor.name}
      renderAdaptPanel={renderAdaptPanel}
    />
  );
}
