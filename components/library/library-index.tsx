import "server-only";

import type { Knex } from "knex";

import { listCutters, listMachineClasses, listMaterials } from "@/lib/catalogue/list-catalogue";
import type { UnitSystem } from "@/lib/machining";
import { listPublishedSheets, type LibraryFilters as Filters } from "@/lib/sheets/list-published-sheets";

import { LibraryFilters } from "./library-filters";
import { SheetCards } from "./sheet-cards";

export type LibraryIndexProps = {
  vendorId: string;
  vendorSlug: string;
  filters: Filters;
  units: UnitSystem;
  /** The "Fits my shop" box: null hides it (no Bench), otherwise whether it is ticked. */
  shop: boolean | null;
  from?: Knex;
};

/** The Library's filters, count and sheet cards. */
export async function LibraryIndex({ vendorId, vendorSlug, filters, units, shop, from }: LibraryIndexProps) {
  const [sheets, cutters, materials, machineClasses] = await Promise.all([
    listPublishedSheets({ vendorId, filters, from }),
    listCutters({ vendorId }),
    listMaterials({ vendorId }),
    listMachineClasses({ vendorId }),
  ]);
  const filtered = Boolean(filters.cutter || filters.material || filters.machineClass || shop);
  return (
    <>
      <LibraryFilters
        action={`/${vendorSlug}/library`}
        filters={filters}
        cutters={cutters}
        materials={materials}
        machineClasses={machineClasses}
        shop={shop}
      />
      <p className="mb-3 text-sm text-stone-600" role="status">
        <span className="num">{sheets.length}</span> {sheets.length === 1 ? "sheet" : "sheets"}
      </p>
      <SheetCards
        sheets={sheets}
        vendorSlug={vendorSlug}
        units={units}
        empty={filtered ? "No sheet matches these filters." : "No sheets are published yet."}
      />
    </>
  );
}
