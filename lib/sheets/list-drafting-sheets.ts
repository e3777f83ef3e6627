import "server-only";

import type { SheetState } from "@/content-schema/sheet-workflow";
import { db } from "@/lib/db/knex";

export type DraftingSheetRow = {
  slug: string;
  title: string;
  cutterSku: string;
  materialName: string;
  machineClassName: string;
  latestNumber: number;
  latestState: SheetState;
  publishedNumber: number | null;
  updatedAt: string;
};

/** Every sheet of the vendor with its latest version's state, for the Drafting list. */
export async function listDraftingSheets({ vendorId }: { vendorId: string }): Promise<DraftingSheetRow[]> {
  const rows = await db("sheets as s")
    .join("cutters as c", "c.id", "s.cutter_id")
    .join("materials as m", "m.id", "s.material_id")
    .join("machine_classes as k", "k.id", "s.machine_class_id")
    .joinRaw(
      `join lateral (select number, state, title, updated_at from sheet_versions v where v.sheet_id = s.id and v.vendor_id = s.vendor_id order by number desc limit 1) lv on true`,
    )
    .joinRaw(`left join sheet_versions pv on pv.sheet_id = s.id and pv.vendor_id = s.vendor_id and pv.state = 'published'`)
    .where("s.vendor_id", vendorId)
    .orderBy("lv.updated_at", "desc")
    .select(
      "s.slug",
      "lv.title",
      "c.sku",
      "m.name as material_name",
      "k.name as class_name",
      "lv.number",
      "lv.state",
      "pv.number as published_number",
      "lv.updated_at",
    );
  return rows.map((r) => ({
    slug: r.slug,
    title: r.title,
    cutterSku: r.sku,
    materialName: r.material_name,
    machineClassName: r.class_name,
    latestNumber: r.number,
    latestState: r.state,
    publishedNumber: r.published_number ?? null,
    updatedAt: new Date(r.updated_at).toISOString(),
  }));
}
