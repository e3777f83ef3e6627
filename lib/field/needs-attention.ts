import "server-only";

import { readDb } from "@/lib/db/read-db";

import { readRollup, type VersionRollup } from "./rollup-rows";
import { weekStartOf } from "./week-series";
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

/** Outcome reports of the weeks that touch from–to (YYYY-MM-DD, inclusive), and one machine class (its slug). */
export type AttentionFilters = { from?: string; to?: string; machineClass?: string };

const OUTCOME_COLUMNS = [
  "outcomes",
  "worked_as_written",
  "worked_after_changes",
  "failed",
  "chatter",
  "melting_welding",
  "poor_finish",
  "broken_tool",
  "stalled_lost_steps",
];

// The version rollup with its outcome counts summed over the weekly rollup's weeks instead: still rollups, never
// a scan of raw outcome reports. Tickets and hand-offs stay whole-life counts.
const WEEKS_SOURCE = `
  select vr.vendor_id, vr.sheet_version_id, vr.sheet_id, vr.number, vr.state, vr.published_at, vr.views, vr.adaptations, vr.setups,
    ${OUTCOME_COLUMNS.map((c) => `w.${c}`).join(", ")}, vr.last_outcome_at, vr.tickets, vr.handoffs, vr.open_handoffs
  from field_version_rollups vr
  join (
    select sheet_version_id, ${OUTCOME_COLUMNS.map((c) => `sum(${c})::int as ${c}`).join(", ")}
    from field_week_rollups
    where vendor_id = ? and week >= ?::date and week <= ?::date
    group by sheet_version_id
  ) w on w.sheet_version_id = vr.sheet_version_id
  where vr.vendor_id = ?`;

/**
 * Published versions with at least one failure, ranked by the lower Wilson bound of their failure share:
 * the versions that fail most *for certain*: at 95 %, 1 failure in 1 report (lower bound 0.21) ranks below
 * 30 in 100 (0.22). Superseded or withdrawn since the last refresh: left out (the live state decides).
 * With a date range, only the reports of the weeks (Monday to Sunday, UTC) that touch it count.
 */
export async function listNeedsAttention({
  vendorId,
  z,
  limit = 25,
  filters = {},
}: {
  vendorId: string;
  z: number;
  limit?: number;
  filters?: AttentionFilters;
}): Promise<AttentionItem[]> {
  const db = await readDb();
  const dated = Boolean(filters.from || filters.to);
  const source = dated ? WEEKS_SOURCE : "select * from field_version_rollups where vendor_id = ?";
  const sourceBindings = dated
    ? [vendorId, weekStartOf(new Date(`${filters.from ?? "1970-01-01"}T00:00:00Z`)), filters.to ?? "9999-12-31", vendorId]
    : [vendorId];
  const { rows } = await db.raw(
    `select r.*, v.title, s.slug as sheet_slug, mc.name as machine_class, ${WILSON_LOWER_SQL} as lower_bound
     from (${source}) r
     cross join (select ?::float8 as z) zz
     join sheet_versions v on v.id = r.sheet_version_id and v.vendor_id = r.vendor_id
     join sheets s on s.id = r.sheet_id and s.vendor_id = r.vendor_id
     join machine_classes mc on mc.id = s.machine_class_id and mc.vendor_id = s.vendor_id
     where r.vendor_id = ? and v.state = 'published' and r.failed > 0 ${filters.machineClass ? "and mc.slug = ?" : ""}
     order by lower_bound desc, r.failed desc, s.slug
     limit ?`,
    [...sourceBindings, z, vendorId, ...(filters.machineClass ? [filters.machineClass] : []), limit],
  );
  return rows.map((r: Record<string, unknown>) => ({
    ...readRollup(r, z),
    sheetSlug: String(r.sheet_slug),
    title: String(r.title),
    machineClass: String(r.machine_class),
    lowerBound: Number(r.lower_bound),
  }));
}
