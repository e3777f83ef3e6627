import "server-only";

import { readDb } from "@/lib/db/read-db";

import { readRollup, type VersionRollup } from "./rollup-rows";
import { WILSON_LOWER_SQL } from "./wilson-sql";

/** How many published versions have a failure: the whole list, of which the page and digest show the top. */
export async function countNeedsAttention({ vendorId }: { vendorId: string }): Promise<number> {
  const db = await readDb();
  const row = await db("field_version_rollups as r")
    .join("sheet_versions as v", function () {
      this.on("v.id", "r.sheet_version_id").andOn("v.vendor_id", "r.vendor_id");
    })
    .where({ "r.vendor_id": vendorId, "v.state": "published" })
    .where("r.failed", ">", 0)
    .first(db.raw("count(*)::int as n"));
  return Number(row?.n ?? 0);
}

export type AttentionItem = VersionRollup & { sheetSlug: string; title: string; machineClass: string; lowerBound: number };

/**
 * Published versions with at least one failure, ranked by the lower Wilson bound of their failure share:
 * the versions that fail most *for certain*: at 95 %, 1 failure in 1 report (lower bound 0.21) ranks below
 * 30 in 100 (0.22). Superseded or withdrawn since the last refresh: left out (the live state decides).
 */
export async function listNeedsAttention({ vendorId, z, limit = 25 }: { vendorId: string; z: number; limit?: number }): Promise<AttentionItem[]> {
  const db = await readDb();
  const { rows } = await db.raw(
    `select r.*, v.title, s.slug as sheet_slug, mc.name as machine_class, ${WILSON_LOWER_SQL} as lower_bound
     from field_version_rollups r
     cross join (select ?::float8 as z) zz
     join sheet_versions v on v.id = r.sheet_version_id and v.vendor_id = r.vendor_id
     join sheets s on s.id = r.sheet_id and s.vendor_id = r.vendor_id
     join machine_classes mc on mc.id = s.machine_class_id and mc.vendor_id = s.vendor_id
     where r.vendor_id = ? and v.state = 'published' and r.failed > 0
     order by lower_bound desc, r.failed desc, s.slug
     limit ?`,
    [z, vendorId, limit],
  );
  return rows.map((r: Record<string, unknown>) => ({ ...readRollup(r, z), sheetSlug: String(r.sheet_slug), title: String(r.title), machineClass: String(r.machine_class), lowerBound: Number(r.lower_bound) }));
}
