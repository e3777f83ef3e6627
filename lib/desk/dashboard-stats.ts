import "server-only";

import { db } from "@/lib/db/knex";

export type DeskDashboard = {
  openByStatus: { status: string; count: number }[];
  overdue: number;
  medianFirstResponseHours: number | null;
  answeredCount: number;
  perSheetVersion: { sheetVersionId: string; label: string; tickets: number }[];
};

/** Open counts, the median first-response time (last 90 days) and tickets per linked sheet version. */
export async function getDeskDashboard({ vendorId }: { vendorId: string }): Promise<DeskDashboard> {
  const [byStatus, overdue, median, perVersion] = await Promise.all([
    db("tickets")
      .where({ vendor_id: vendorId })
      .whereNot("status", "closed")
      .groupBy("status")
      .select("status")
      .count<{ status: string; count: string }[]>("* as count"),
    db("tickets")
      .where({ vendor_id: vendorId })
      .whereNot("status", "closed")
      .whereNull("first_response_at")
      .where("first_response_due_at", "<", db.fn.now())
      .count<{ count: string }[]>("* as count")
      .first(),
    db("tickets")
      .where({ vendor_id: vendorId })
      .whereNotNull("first_response_at")
      .where("created_at", ">", db.raw("now() - interval '90 days'"))
      .first<{ median: number | null; n: string }>(
        db.raw("percentile_cont(0.5) within group (order by extract(epoch from first_response_at - created_at)) / 3600.0 as median"),
        db.raw("count(*) as n"),
      ),
    db("ticket_sheet_links as l")
      .join("sheet_versions as v", "v.id", "l.sheet_version_id")
      .where({ "l.vendor_id": vendorId, "v.vendor_id": vendorId })
      .groupBy("l.sheet_version_id", "v.title", "v.number")
      .orderByRaw("count(*) desc")
      .limit(15)
      .select("l.sheet_version_id", "v.title", "v.number")
      .count<{ sheet_version_id: string; title: string; number: number; count: string }[]>("* as count"),
  ]);
  return {
    openByStatus: byStatus.map((r) => ({ status: r.status, count: Number(r.count) })),
    overdue: Number(overdue?.count ?? 0),
    medianFirstResponseHours: median?.median == null ? null : Number(median.median),
    answeredCount: Number(median?.n ?? 0),
    perSheetVersion: perVersion.map((r) => ({
      sheetVersionId: r.sheet_version_id,
      label: `${r.title} v${r.number}`,
      tickets: Number(r.count),
    })),
  };
}
