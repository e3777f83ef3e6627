import "server-only";

import { writeAudit } from "@/lib/audit/write-audit";
import { lockIdempotencyKey } from "@/lib/db/idempotent";
import { db } from "@/lib/db/knex";
import { InvalidInput, NotFound } from "@/lib/errors/domain-errors";
import { scheduleFieldRefresh } from "@/lib/field/refresh-rollups";

export type ProblemReport = {
  id: string;
  sheetVersionId: string;
  ticketId: string | null;
  ticketNumber: number | null;
  reportedBy: string | null;
  reporterName: string | null;
  summary: string;
  details: string;
  status: "open" | "resolved";
  createdAt: string;
};

type CreateOptions = {
  vendorId: string;
  actorUserId: string;
  ticketId: string;
  sheetVersionId: string;
  summary: string;
  details: string;
  idempotencyKey?: string;
};

/** Hand-off to engineering: a problem with one sheet version, raised from a ticket. */
export async function createProblemReport(o: CreateOptions): Promise<{ id: string; created: boolean }> {
  return db.transaction(async (trx) => {
    if (o.idempotencyKey) {
      await lockIdempotencyKey(trx, "problem-report", o.idempotencyKey);
      const earlier = await trx("problem_reports")
        .where({ vendor_id: o.vendorId, reported_by: o.actorUserId, idempotency_key: o.idempotencyKey })
        .first<{ id: string } | undefined>("id");
      if (earlier) return { id: earlier.id, created: false };
    }
    const ticket = await trx("tickets").where({ id: o.ticketId, vendor_id: o.vendorId }).first("id");
    if (!ticket) throw new NotFound();
    const version = await trx("sheet_versions").where({ id: o.sheetVersionId, vendor_id: o.vendorId }).first("id");
    if (!version)
      throw new InvalidInput("Please correct the marked fields.", { sheetVersionId: ["Choose a sheet version of this vendor."] });
    const [row] = await trx("problem_reports")
      .insert({
        vendor_id: o.vendorId,
        sheet_version_id: o.sheetVersionId,
        ticket_id: o.ticketId,
        reported_by: o.actorUserId,
        summary: o.summary,
        details: o.details,
        idempotency_key: o.idempotencyKey ?? null,
      })
      .returning<{ id: string }[]>("id");
    await writeAudit(
      {
        vendorId: o.vendorId,
        actorUserId: o.actorUserId,
        action: "ticket.handoff",
        objectType: "ticket",
        objectId: o.ticketId,
        details: { problemReportId: row.id, sheetVersionId: o.sheetVersionId },
      },
      trx,
    );
    await scheduleFieldRefresh(trx);
    return { id: row.id, created: true };
  });
}

/** Problem reports for the Drafting side, newest first; optionally for one sheet version or one sheet's versions. */
export async function listProblemReports({
  vendorId,
  sheetVersionId,
  sheetId,
}: {
  vendorId: string;
  sheetVersionId?: string;
  sheetId?: string;
}): Promise<ProblemReport[]> {
  const q = db("problem_reports as p")
    .leftJoin("tickets as t", function () {
      this.on("t.id", "p.ticket_id").andOn("t.vendor_id", "p.vendor_id");
    })
    .leftJoin("users as u", "u.id", "p.reported_by")
    .where("p.vendor_id", vendorId)
    .select("p.*", "t.number as ticket_number", "u.name as reporter_name", "u.email as reporter_email")
    .orderBy("p.created_at", "desc");
  if (sheetVersionId) q.where("p.sheet_version_id", sheetVersionId);
  if (sheetId) q.whereIn("p.sheet_version_id", db("sheet_versions").where({ vendor_id: vendorId, sheet_id: sheetId }).select("id"));
  const rows = await q;
  return rows.map((r) => ({
    id: r.id,
    sheetVersionId: r.sheet_version_id,
    ticketId: r.ticket_id,
    ticketNumber: r.ticket_number ?? null,
    reportedBy: r.reported_by,
    reporterName: r.reporter_name || r.reporter_email || null,
    summary: r.summary,
    details: r.details,
    status: r.status,
    createdAt: new Date(r.created_at).toISOString(),
  }));
}
