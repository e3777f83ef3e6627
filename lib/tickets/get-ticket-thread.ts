import "server-only";

import { ticketCardSchema } from "@/content-schema/ticket-card";
import { db } from "@/lib/db/knex";
import { NotFound } from "@/lib/errors/domain-errors";

import { selectTickets, toTicketDetail } from "./ticket-select";
import type { LinkedSheet, TicketAttachment, TicketMessage, TicketThread } from "./ticket-types";

export type Viewer = { kind: "customer"; userId: string } | { kind: "staff" };

const iso = (v: unknown) => (v instanceof Date ? v.toISOString() : String(v));

/**
 * One ticket with its thread. A customer reads only their own tickets, and internal notes
 * (and files attached to notes) are filtered out in the query itself, never after loading.
 */
export async function getTicketThread({
  vendorId,
  ticketId,
  viewer,
}: {
  vendorId: string;
  ticketId: string;
  viewer: Viewer;
}): Promise<TicketThread> {
  const query = selectTickets(db, vendorId).where("t.id", ticketId);
  if (viewer.kind === "customer") query.where("t.customer_id", viewer.userId);
  const row = await query.first();
  if (!row) throw new NotFound();
  const ticket = toTicketDetail(row);

  const messagesQuery = db("ticket_messages as m")
    .leftJoin("users as u", "u.id", "m.author_id")
    .leftJoin("members as mem", function () {
      this.on("mem.user_id", "m.author_id").andOn("mem.vendor_id", "m.vendor_id");
    })
    .where({ "m.vendor_id": vendorId, "m.ticket_id": ticketId })
    .select("m.*", "u.name as author_name", "u.email as author_email", "mem.role as author_role")
    .orderBy([{ column: "m.created_at" }, { column: "m.id" }]);
  if (viewer.kind === "customer") messagesQuery.where("m.visibility", "public");

  const attachmentsQuery = db("ticket_attachments as a")
    .leftJoin("ticket_messages as m", "m.id", "a.message_id")
    .where({ "a.vendor_id": vendorId, "a.ticket_id": ticketId })
    .select("a.id", "a.message_id", "a.file_name", "a.content_type", "a.kind", "a.size_bytes")
    .orderBy("a.created_at");
  if (viewer.kind === "customer") attachmentsQuery.where((w) => w.whereNull("a.message_id").orWhere("m.visibility", "public"));

  const linksQuery = db("ticket_sheet_links as l")
    .join("sheet_versions as v", "v.id", "l.sheet_version_id")
    .join("sheets as s", "s.id", "v.sheet_id")
    .leftJoin("machines as mach", "mach.id", "l.machine_id")
    .where({ "l.vendor_id": vendorId, "l.ticket_id": ticketId, "v.vendor_id": vendorId })
    .select("l.sheet_version_id", "s.slug", "v.number", "v.title", "v.state", "l.machine_id", "mach.name as machine_name")
    .orderBy("l.created_at");

  const [messages, attachments, links] = await Promise.all([messagesQuery, attachmentsQuery, linksQuery]);
  return {
    ticket,
    messages: messages.map((m): TicketMessage => ({
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
    attachments: attachments.map((a): TicketAttachment => ({
      id: a.id,
      messageId: a.message_id,
      fileName: a.file_name,
      contentType: a.content_type,
      kind: a.kind,
      sizeBytes: a.size_bytes,
    })),
    links: links.map((l): LinkedSheet => ({
      sheetVersionId: l.sheet_version_id,
      sheetSlug: l.slug,
      versionNumber: l.number,
      title: l.title,
      state: l.state,
      machineId: l.machine_id,
      machineName: l.machine_name,
    })),
  };
}
