import "server-only";

import { cacheLife, cacheTag } from "next/cache";

import { CutterQrLinks } from "@/components/bench/cutter-qr-links";
import { cutterShortUrl } from "@/lib/bench/cutter-links";
import { findCutterBySku } from "@/lib/catalogue/find-catalogue-item";
import { libraryCacheDb, libraryTag } from "@/lib/library/library-cache";
import type { UnitSystem } from "@/lib/machining";
import { listPublishedSheets } from "@/lib/sheets/list-published-sheets";

import { CutterCard } from "./cutter-card";
import { SheetCards } from "./sheet-cards";

// A cutter and its published sheets from Next's cache; catalogue edits and publishing drop the vendor's Library
// tag (lib/library/library-cache.ts). Access is checked per request by the layout and the page.

/** The vendor's cutter by SKU, or null; `_generation` (lib/library/library-generation.ts) is only part of the key. */
export async function getCachedLibraryCutter(vendorId: string, sku: string, _generation: string) {
  "use cache";
  cacheLife("minutes");
  cacheTag(libraryTag(vendorId));
  return findCutterBySku({ vendorId, sku });
}

/** The cutter's card, its short link and QR codes, and its published sheets. */
export async function CachedCutterSheets({
  vendorId,
  vendorSlug,
  sku,
  generation,
  units,
}: {
  vendorId: string;
  vendorSlug: string;
  sku: string;
  generation: string;
  units: UnitSystem;
}) {
  "use cache";
  cacheLife("minutes");
  cacheTag(libraryTag(vendorId));
  const cutter = await getCachedLibraryCutter(vendorId, sku, generation);
  if (!cutter) return null;
  const sheets = await listPublishedSheets({ vendorId, filters: { cutter: cutter.sku }, from: libraryCacheDb });
  return (
    <>
      <div className="mb-6 max-w-xl">
        <CutterCard cutter={cutter} units={units} vendorSlug={vendorSlug} />
        <div className="mt-3 print:block">
          <CutterQrLinks vendorSlug={vendorSlug} sku={cutter.sku} shortUrl={cutterShortUrl(cutter.shortCode)} />
        </div>
      </div>
      <SheetCards sheets={sheets} vendorSlug={vendorSlug} units={units} empty="No sheet is published for this cutter yet." />
    </>
  );
}
