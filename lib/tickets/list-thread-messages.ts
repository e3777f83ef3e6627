import "server-only";

import { LATEST_THREAD_MESSAGES, type ThreadMessages } from "@/content-schema/api-queries";
import { ticketCardSchema } from "@/content-schema/ticket-card";
import { db } from "@/lib/db/knex";

import type { TicketMessage } from "./ticket-types";

export type ThreadViewer = { kind: "customer"; userId: string } | { kind: "staff" };

const iso = (v: unknown) => (v instanceof Date ? v.toISOString() : String(v));

/** The messages this viewer may see of one ticket (customers: no internal notes), as a query to build on. */
function visibleMessages(vendorId: string, ticketId: string, viewer: ThreadViewer) {
  const query = db("ticket_messages as m").where({ "m.vendor_id": vendorId, "m.ticket_id": ticketId });
  if (viewer.kind === "customer") query.where("m.visibility", "public");
  return query;
}

async function countVisible(vendorId: string, ticketId: string, viewer: ThreadViewer) {
  const [{ count }] = await visibleMessages(vendorId, ticketId, viewer).count<{ count: string }[]>("m.id as count");
  return Number(count);
}

/**
 * The ids of the messages a thread shows: all of them, or only the latest few. A subquery, so the rows, their
 * attachments and the count of earlier messages are read in parallel and no more rows than are shown leave the database.
 */
export function shownMessageIds(vendorId: string, ticketId: string, viewer: ThreadViewer, messages: ThreadMessages) {
  const ids = visibleMessages(vendorId, ticketId, viewer).select("m.id");
  if (messages === "all") return ids;
  return ids
    .orderBy([
      { column: "m.created_at", order: "desc" },
      { column: "m.id", order: "desc" },
    ])
    .limit(LATEST_THREAD_MESSAGES);
}

/** The shown messages, oldest first, and how many earlier ones are folded away. */
export async function listThreadMessages({
  vendorId,
  ticketId,
  viewer,
  messages,
}: {
  vendorId: string;
  ticketId: string;
  viewer: ThreadViewer;
  messages: ThreadMessages;
}): Promise<{ messages: TicketMessage[]; earlierCount: number }> {
  const rowsQuery = db("ticket_messages as m")
    .leftJoin("users as u", "u.id", "m.author_id")
    .leftJoin("members as mem", function () {
      this.on("mem.user_id", "m.author_id").andOn("mem.vendor_id", "m.vendor_id");
    })
    .where({ "m.vendor_id": vendorId, "m.ticket_id": ticketId })
    .whereIn("m.id", shownMessageIds(vendorId, ticketId, viewer, messages))
    .select("m.*", "u.name as author_name", "u.email as author_email", "mem.role as author_role")
    .orderBy([{ column: "m.created_at" }, { column: "m.id" }]);
  const [rows, total] = await Promise.all([rowsQuery, messages === "all" ? null : countVisible(vendorId, ticketId, viewer)]);
  return {
    messages: rows.map((m): TicketMessage => ({
      id: m.id,
      authorId: m.author_id,
      authorName: m.author_name || m.author_email || "Former member",
      authorIsStaff: m.author_role != null && m.author_role !== "customer",
      visibility: m.visibility,
      source: m.source,
      body: m.body,
      card: m.card ? (ticketCardSchema.safeParse(m.card).data ?? null) : null,
      createdAt: iso(m.created_at),
    })),
    // Max: a message added between the two reads must not make the count negative.
    earlierCount: total == null ? 0 : Math.max(0, total - rows.length),
  };
}
