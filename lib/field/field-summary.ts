import "server-only";

import { readDb } from "@/lib/db/read-db";

export type FieldSummary = {
  versionsWithReports: number;
  outcomes: number;
  failed: number;
  workedAfterChanges: number;
  setups: number;
  views: number;
  adaptations: number;
  tickets: number;
  openHandoffs: number;
};
type SummaryRow = Record<
  | "versions_with_reports"
  | "outcomes"
  | "failed"
  | "worked_after_changes"
  | "setups"
  | "views"
  | "adaptations"
  | "tickets"
  | "open_handoffs",
  number
>;

/** The vendor's totals, from the rollup (one row per version), never from raw outcomes. */
export async function getFieldSummary({ vendorId }: { vendorId: string }): Promise<FieldSummary> {
  const db = await readDb();
  const row = await db("field_version_rollups")
    .where({ vendor_id: vendorId })
    .first<SummaryRow | undefined>(
      db.raw("count(*) filter (where outcomes > 0)::int as versions_with_reports"),
      db.raw("coalesce(sum(outcomes), 0)::int as outcomes"),
      db.raw("coalesce(sum(failed), 0)::int as failed"),
      db.raw("coalesce(sum(worked_after_changes), 0)::int as worked_after_changes"),
      db.raw("coalesce(sum(setups), 0)::int as setups"),
      db.raw("coalesce(sum(views), 0)::int as views"),
      db.raw("coalesce(sum(adaptations), 0)::int as adaptations"),
      db.raw("coalesce(sum(tickets), 0)::int as tickets"),
      db.raw("coalesce(sum(open_handoffs), 0)::int as open_handoffs"),
    );
  // An aggregate without GROUP BY always answers one row.
  if (!row) throw new Error("The field summary query returned no row.");
  return {
    versionsWithReports: row.versions_with_reports,
    outcomes: row.outcomes,
    failed: row.failed,
    workedAfterChanges: row.worked_after_changes,
    setups: row.setups,
    views: row.views,
    adaptations: row.adaptations,
    tickets: row.tickets,
    openHandoffs: row.open_handoffs,
  };
}
