import "server-only";

import type { Knex } from "knex";

import type { TicketDetail } from "./ticket-types";

type Row = Record<string, unknown>;

/** The ticket columns every list and page reads, with customer, assignee and material names. */
export function selectTickets(trx: Knex, vendorId: string): Knex.QueryBuilder {
  return trx("tickets as t")
    .join("users as c", "c.id", "t.customer_id")
    .leftJoin("users as a", "a.id", "t.assignee_id")
    .leftJoin("materials as mat", function () {
      this.on("mat.id", "t.material_id").andOn("mat.vendor_id", "t.vendor_id");
    })
    .leftJoin("machines as mach", function () {
      this.on("mach.id", "t.machine_id").andOn("mach.vendor_id", "t.vendor_id");
    })
    .where("t.vendor_id", vendorId)
    .select(
      "t.*",
      "c.name as customer_name",
      "c.email as customer_email",
      "a.name as assignee_name",
      "a.email as assignee_email",
      "mat.name as material_name",
      "mach.name as machine_name",
      trx.raw("(t.first_response_at is null and t.status <> 'closed' and t.first_response_due_at < now()) as overdue"),
    );
}

const iso = (v: unknown) => (v instanceof Date ? v.toISOString() : v == null ? null : String(v));

export function toTicketDetail(r: Row): TicketDetail {
  return {
    id: String(r.id),
    number: Number(r.number),
    subject: String(r.subject),
    body: String(r.body),
    status: r.status as TicketDetail["status"],
    priority: r.priority as TicketDetail["priority"],
    customerId: String(r.customer_id),
    customerName: String(r.customer_name || r.customer_email),
    customerEmail: String(r.customer_email),
    assigneeId: (r.assignee_id as string | null) ?? null,
    assigneeName: r.assignee_id ? String(r.assignee_name || r.assignee_email) : null,
    materialId: (r.material_id as string | null) ?? null,
    materialName: (r.material_name as string | null) ?? null,
    machineId: (r.machine_id as string | null) ?? null,
    machineName: (r.machine_name as string | null) ?? null,
    tags: (r.tags as string[]) ?? [],
    firstResponseDueAt: iso(r.first_response_due_at)!,
    firstResponseAt: iso(r.first_response_at),
    overdue: Boolean(r.overdue),
    createdAt: iso(r.created_at)!,
    lastActivityAt: iso(r.last_activity_at)!,
    closedAt: iso(r.closed_at),
    satisfaction: (r.satisfaction as number | null) ?? null,
    satisfactionComment: (r.satisfaction_comment as string | null) ?? null,
  };
}
