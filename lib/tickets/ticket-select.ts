import "server-only";

import type { Knex } from "knex";

import type { TicketRow } from "@/lib/db/tables";

import type { TicketDetail } from "./ticket-types";

/** A tickets row with the names `selectTickets` joins in. */
export type TicketWithNamesRow = TicketRow & {
  customer_name: string;
  customer_email: string;
  assignee_name: string | null;
  assignee_email: string | null;
  material_name: string | null;
  machine_name: string | null;
  overdue: boolean;
};

/** The ticket columns every list and page reads, with customer, assignee and material names. */
export function selectTickets(trx: Knex, vendorId: string) {
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
    .select<TicketWithNamesRow[]>(
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

const iso = (v: Date) => v.toISOString();
const isoOrNull = (v: Date | null) => (v ? v.toISOString() : null);

export function toTicketDetail(r: TicketWithNamesRow): TicketDetail {
  return {
    id: r.id,
    number: r.number,
    subject: r.subject,
    body: r.body,
    status: r.status,
    priority: r.priority,
    customerId: r.customer_id,
    customerName: r.customer_name || r.customer_email,
    customerEmail: r.customer_email,
    assigneeId: r.assignee_id,
    assigneeName: r.assignee_id ? r.assignee_name || r.assignee_email : null,
    materialId: r.material_id,
    materialName: r.material_name,
    machineId: r.machine_id,
    machineName: r.machine_name,
    tags: r.tags ?? [],
    firstResponseDueAt: iso(r.first_response_due_at),
    firstResponseAt: isoOrNull(r.first_response_at),
    overdue: Boolean(r.overdue),
    createdAt: iso(r.created_at),
    lastActivityAt: iso(r.last_activity_at),
    closedAt: isoOrNull(r.closed_at),
    satisfaction: r.satisfaction,
    satisfactionComment: r.satisfaction_comment,
  };
}
