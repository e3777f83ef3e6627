import "server-only";

import { cacheLife, cacheTag } from "next/cache";
import type { ReactNode } from "react";

import { librarySheetTag, libraryTag } from "@/lib/library/library-cache";
import type { UnitSystem } from "@/lib/machining";
import type { LibrarySheet } from "@/lib/sheets/find-library-sheet";

import { getCachedLibrarySheet } from "./cached-library-sheet";
import { SheetView } from "./sheet-view";

type Props = {
  vendorId: string;
  vendorSlug: string;
  vendorName: string;
  data: LibrarySheet;
  /** The vendor's Library generation the data was read under (part of the cache key). */
  generation: string;
  units: UnitSystem;
  renderAdaptPanel?: (slot: { index: number; operation: LibrarySheet["frontMatter"]["operations"][number] }) => ReactNode;
};

type CachedProps = {
  vendorId: string;
  vendorSlug: string;
  vendorName: string;
  slug: string;
  number: number;
  generation: string;
  units: UnitSystem;
  adaptPanels: ReactNode[];
};

// Rendered once per version and unit system; the adapt panels (the reader's own machines) pass through
// as holes, so the entry holds nothing personal.
async function CachedSheet({ vendorId, vendorSlug, vendorName, slug, number, generation, units, adaptPanels }: CachedProps) {
  "use cache";
  cacheLife("minutes");
  cacheTag(libraryTag(vendorId));
  const data = await getCachedLibrarySheet(vendorId, slug, number, generation);
  if (!data) return null;
  cacheTag(librarySheetTag(data.sheet.id));
  return (
    <SheetView
      data={data}
      units={units}
      vendorSlug={vendorSlug}
      vendorName={vendorName}
      renderAdaptPanel={({ index }) => adaptPanels[index] ?? null}
    />
  );
}

/** SheetView served from Next's cache: the page's access checks and personal parts stay per request. */
export function CachedSheetView({ vendorId, vendorSlug, vendorName, data, generation, units, renderAdaptPanel }: Props) {
  const adaptPanels = data.frontMatter.operations.map((operation, index) => renderAdaptPanel?.({ index, operation }) ?? null);
  return (
    <CachedSheet
      vendorId={vendorId}
      vendorSlug={vendorSlug}
      vendorName={vendorName}
      slug={data.sheet.slug}
      number={data.version.number}
      generation={generation}
      units={units}
      adaptPanels={adaptPanels}
    />
  );
}
