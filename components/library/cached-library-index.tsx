import "server-only";

import { cacheLife, cacheTag } from "next/cache";

import { listCutters, listMachineClasses, listMaterials } from "@/lib/catalogue/list-catalogue";
import { libraryCacheDb, libraryTag } from "@/lib/library/library-cache";
import type { UnitSystem } from "@/lib/machining";
import { type LibraryFilters as Filters, listPublishedSheets } from "@/lib/sheets/list-published-sheets";

import { LibraryFilters } from "./library-filters";
import { SheetCards } from "./sheet-cards";

type Props = { vendorId: string; vendorSlug: string; filters: Filters; units: UnitSystem };

/**
 * The Library index below its header from Next's cache, per filter and unit system: publishing, withdrawing and
 * catalogue edits drop the vendor's Library tag (lib/library/library-cache.ts). Access is checked by the page.
 */
export async function CachedLibraryIndex({ vendorId, vendorSlug, filters, units }: Props) {
  "use cache";
  cacheLife("minutes");
  cacheTag(libraryTag(vendorId));
  const [sheets, cutters, materials, machineClasses] = await Promise.all([
    listPublishedSheets({ vendorId, filters, from: libraryCacheDb }),
    listCutters({ vendorId }),
    listMaterials({ vendorId }),
    listMachineClasses({ vendorId }),
  ]);
  const filtered = Boolean(filters.cutter || filters.material || filters.machineClass);
  return (
    <>
      <LibraryFilters action={`/${vendorSlug}/library`} filters={filters} cutters={cutters} materials={materials} machineClasses={machineClasses} />
      <p className="mb-3 text-sm text-stone-600" role="status"><span className="num">{sheets.length}</span> {sheets.length === 1 ? "sheet" : "sheets"}</p>
      <SheetCards sheets={sheets} vendorSlug={vendorSlug} units={units} empty={filtered ? "No sheet matches these filters." : "No sheets are published yet."} />
    </>
  );
}
