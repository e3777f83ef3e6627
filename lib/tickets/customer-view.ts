import type { TicketDetail, TicketMessage, TicketThread } from "./ticket-types";

// Pure: what a customer may see of their own ticket. Triage (priority, tags, overdue), the assignee and staff
// members' ids and e-mail addresses stay on the Desk; internal notes are already left out by the query.

export type CustomerTicket = Pick<
  TicketDetail,
  | "id"
  | "number"
  | "subject"
  | "body"
  | "status"
  | "materialId"
  | "materialName"
  | "machineId"
  | "machineName"
  | "firstResponseDueAt"
  | "firstResponseAt"
  | "createdAt"
  | "lastActivityAt"
  | "closedAt"
  | "satisfaction"
  | "satisfactionComment"
>;

export type CustomerMessage = Omit<TicketMessage, "authorId">;

export type CustomerTicketThread = Omit<TicketThread, "ticket" | "messages"> & { ticket: CustomerTicket; messages: CustomerMessage[] };

const EMAIL = /\S+@\S+/;

export function toCustomerTicket(t: TicketDetail): CustomerTicket {
  return {
    id: t.id,
    number: t.number,
    subject: t.subject,
    body: t.body,
    status: t.status,
    materialId: t.materialId,
    materialName: t.materialName,
    machineId: t.machineId,
    machineName: t.machineName,
    firstResponseDueAt: t.firstResponseDueAt,
    firstResponseAt: t.firstResponseAt,
    createdAt: t.createdAt,
    lastActivityAt: t.lastActivityAt,
    closedAt: t.closedAt,
    satisfaction: t.satisfaction,
    satisfactionComment: t.satisfactionComment,
  };
}

export function toCustomerMessage(m: TicketMessage): CustomerMessage {
  // A staff member without a name would otherwise be shown by their e-mail address.
  const authorName = m.authorIsStaff && EMAIL.test(m.authorName) ? "Support team" : m.authorName;
  return {
    id: m.id,
    authorName,
    authorIsStaff: m.authorIsStaff,
    visibility: m.visibility,
    source: m.source,
    body: m.body,
    card: m.card,
    createdAt: m.createdAt,
  };
}

export function toCustomerThread(thread: TicketThread): CustomerTicketThread {
  return { ...thread, ticket: toCustomerTicket(thread.ticket), messages: thread.messages.map(toCustomerMessage) };
}
