import "server-only";

import type { ThreadMessages } from "@/content-schema/api-queries";
import { db } from "@/lib/db/knex";
import { NotFound } from "@/lib/errors/domain-errors";

import { listThreadMessages, shownMessageIds, type ThreadViewer } from "./list-thread-messages";
import { selectTickets, toTicketDetail } from "./ticket-select";
import type { LinkedSheet, TicketAttachment, TicketThread } from "./ticket-types";

/**
 * One ticket with its thread: the question, then all messages or only the latest (`earlierCount` says how many are
 * folded away), with the attachments of what is shown. A customer reads only their own tickets, and internal notes
 * (and files attached to notes) are filtered out in the query itself, never after loading.
 */
export async function getTicketThread({
  vendorId,
  ticketId,
  viewer,
  messages = "latest",
}: {
  vendorId: string;
  ticketId: string;
  viewer: ThreadViewer;
  messages?: ThreadMessages;
}): Promise<TicketThread> {
  const query = selectTickets(db, vendorId).where("t.id", ticketId);
  if (viewer.kind === "customer") query.where("t.customer_id", viewer.userId);
  const row = await query.first();
  if (!row) throw new NotFound();
  const ticket = toTicketDetail(row);

  const attachmentsQuery = db("ticket_attachments as a")
    .leftJoin("ticket_messages as m", "m.id", "a.message_id")
    .where({ "a.vendor_id": vendorId, "a.ticket_id": ticketId })
    .where((w) => w.whereNull("a.message_id").orWhereIn("a.message_id", shownMessageIds(vendorId, ticketId, viewer, messages)))
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

  const [shown, attachments, links] = await Promise.all([
    listThreadMessages({ vendorId, ticketId, viewer, messages }),
    attachmentsQuery,
    linksQuery,
  ]);
  return {
    ticket,
    messages: shown.messages,
    earlierCount: shown.earlierCount,
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
