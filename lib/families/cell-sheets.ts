import "server-only";

import type { Knex } from "knex";

import type { SheetFrontMatter, SheetOperation } from "@/content-schema/sheet-front-matter";
import type { SheetState } from "@/content-schema/sheet-workflow";
import { readStoredOperations } from "@/lib/adapt/read-front-matter";
import { db } from "@/lib/db/knex";
import type { SheetRow } from "@/lib/db/tables";
import { storedFrontMatter } from "@/lib/sheets/version-rows";

import { cellKey } from "./compute-cells";

// The sheets that already exist for a family's cells.

export type CellSheet = {
  id: string;
  slug: string;
  latest: { id: string; number: number; state: SheetState; operations: SheetOperation[] };
  published: { id: string; number: number; frontMatter: SheetFrontMatter } | null;
};

/** A cell's sheet with its newest and its published version. */
type CellSheetRow = Pick<SheetRow, "id" | "slug" | "cutter_id" | "material_id" | "machine_class_id"> & {
  latest_id: string;
  latest_number: number;
  latest_state: SheetState;
  latest_fm: unknown;
  pub_id: string | null;
  pub_number: number | null;
  pub_fm: unknown;
};

const publishedOf = (r: CellSheetRow): CellSheet["published"] => {
  const frontMatter = storedFrontMatter(r.pub_fm);
  return r.pub_id && r.pub_number !== null && frontMatter ? { id: r.pub_id, number: r.pub_number, frontMatter } : null;
};

export async function listCellSheets({
  vendorId,
  cutterIds,
  materialIds,
  machineClassIds,
  trx = db,
}: {
  vendorId: string;
  cutterIds: string[];
  materialIds: string[];
  machineClassIds: string[];
  trx?: Knex;
}): Promise<Map<string, CellSheet>> {
  const { rows } = await trx.raw<{ rows: CellSheetRow[] }>(
    `select s.id, s.slug, s.cutter_id, s.material_id, s.machine_class_id,
            lv.id as latest_id, lv.number as latest_number, lv.state as latest_state, lv.front_matter as latest_fm,
            pv.id as pub_id, pv.number as pub_number, pv.front_matter as pub_fm
       from sheets s
       join lateral (select id, number, state, front_matter from sheet_versions v
                      where v.sheet_id = s.id and v.vendor_id = s.vendor_id order by number desc limit 1) lv on true
       left join lateral (select id, number, front_matter from sheet_versions v
                      where v.sheet_id = s.id and v.vendor_id = s.vendor_id and v.state = 'published' limit 1) pv on true
      where s.vendor_id = ? and s.cutter_id = any(?::uuid[]) and s.material_id = any(?::uuid[]) and s.machine_class_id = any(?::uuid[])
      order by s.created_at desc`,
    [vendorId, cutterIds, materialIds, machineClassIds],
  );
  const map = new Map<string, CellSheet>();
  // The oldest sheet of a triple is the cell's sheet (later ones are hand-made variants).
  for (const r of rows) {
    map.set(cellKey(r.cutter_id, r.material_id, r.machine_class_id), {
      id: r.id,
      slug: r.slug,
      latest: { id: r.latest_id, number: r.latest_number, state: r.latest_state, operations: readStoredOperations(r.latest_fm) },
      published: publishedOf(r),
    });
  }
  return map;
}
