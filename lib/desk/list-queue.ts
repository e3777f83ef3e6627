import "server-only";

import type { Knex } from "knex";

import { db } from "@/lib/db/knex";
import { selectTickets, toTicketDetail } from "@/lib/tickets/ticket-select";
import type { TicketSummary } from "@/lib/tickets/ticket-types";

import type { QueueFilters } from "./queue-filters";
import { QUEUE_PAGE_SIZE, type QueuePage } from "./queue-page";

/** Applies queue filters to a `tickets as t` query; without a status filter, closed tickets are left out. */
export function applyQueueFilters<Q extends Knex.QueryBuilder>(q: Q, f: QueueFilters, userId: string): Q {
  if (f.status?.length) q.whereIn("t.status", f.status);
  else q.whereNot("t.status", "closed");
  if (f.priority?.length) q.whereIn("t.priority", f.priority);
  if (f.assignee === "me") q.where("t.assignee_id", userId);
  else if (f.assignee === "none") q.whereNull("t.assignee_id");
  else if (f.assignee) q.where("t.assignee_id", f.assignee);
  if (f.tag) q.whereRaw("? = any(t.tags)", [f.tag]);
  if (f.materialId) q.where("t.material_id", f.materialId);
  if (f.overdue) q.whereNull("t.first_response_at").whereNot("t.status", "closed").where("t.first_response_due_at", "<", db.fn.now());
  if (f.q) {
    const number = /^#?(\d{1,9})$/.exec(f.q)?.[1];
    const words = `%${f.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    q.where((w) => {
      if (number) w.orWhere("t.number", Number(number));
      w.orWhereILike("t.subject", words).orWhereILike("t.body", words);
    });
  }
  return q;
}

const ORDER: Record<NonNullable<QueueFilters["sort"]>, [string, "asc" | "desc"]> = {
  newest: ["t.created_at", "desc"],
  oldest: ["t.created_at", "asc"],
  target: ["t.first_response_due_at", "asc"],
};

/** The Desk queue: tickets of one vendor by filters, newest first unless another order is chosen. */
export async function listQueue({
  vendorId,
  userId,
  filters,
  limit = 500,
  offset = 0,
}: {
  vendorId: string;
  userId: string;
  filters: QueueFilters;
  limit?: number;
  offset?: number;
}): Promise<TicketSummary[]> {
  const [column, direction] = ORDER[filters.sort ?? "newest"];
  const q = applyQueueFilters(selectTickets(db, vendorId), filters, userId)
    .orderBy(column, direction)
    .orderBy("t.number", direction)
    .limit(limit)
    .offset(offset);
  const rows = await q;
  return rows.map((r) => {
    const { body: _body, machineName: _m, closedAt: _c, satisfaction: _s, satisfactionComment: _sc, ...summary } = toTicketDetail(r);
    return summary;
  });
}

/** One page of the Desk queue (pages start at 1); one row more than a page tells whether another follows. */
export async function listQueuePage({
  vendorId,
  userId,
  filters,
  page,
}: {
  vendorId: string;
  userId: string;
  filters: QueueFilters;
  page: number;
}): Promise<QueuePage<TicketSummary>> {
  const rows = await listQueue({ vendorId, userId, filters, limit: QUEUE_PAGE_SIZE + 1, offset: (page - 1) * QUEUE_PAGE_SIZE });
  return { tickets: rows.slice(0, QUEUE_PAGE_SIZE), page, pageSize: QUEUE_PAGE_SIZE, hasMore: rows.length > QUEUE_PAGE_SIZE };
}
