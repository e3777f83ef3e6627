import type { TicketCard } from "@/content-schema/ticket-card";
import type { MessageVisibility, TicketPriority, TicketStatus } from "@/content-schema/ticket-status";

export type TicketSummary = {
  id: string;
  number: number;
  subject: string;
  status: TicketStatus;
  priority: TicketPriority;
  customerId: string;
  customerName: string;
  customerEmail: string;
  assigneeId: string | null;
  assigneeName: string | null;
  materialId: string | null;
  materialName: string | null;
  machineId: string | null;
  tags: string[];
  firstResponseDueAt: string;
  firstResponseAt: string | null;
  overdue: boolean;
  createdAt: string;
  lastActivityAt: string;
};

export type TicketDetail = TicketSummary & {
  body: string;
  machineName: string | null;
  closedAt: string | null;
  satisfaction: number | null;
  satisfactionComment: string | null;
};

export type TicketAttachment = {
  id: string;
  messageId: string | null;
  fileName: string;
  contentType: string;
  kind: "image" | "pdf" | "text";
  sizeBytes: number;
};

export type TicketMessage = {
  id: string;
  authorId: string | null;
  authorName: string;
  authorIsStaff: boolean;
  visibility: MessageVisibility;
  source: "web" | "email" | "api";
  body: string;
  card: TicketCard | null;
  createdAt: string;
};

export type LinkedSheet = {
  sheetVersionId: string;
  sheetSlug: string;
  versionNumber: number;
  title: string;
  state: string;
  machineId: string | null;
  machineName: string | null;
};

export type TicketThread = {
  ticket: TicketDetail;
  messages: TicketMessage[];
  /** Messages before the shown ones that the thread folds away (0 when the whole thread is shown). */
  earlierCount: number;
  attachments: TicketAttachment[];
  links: LinkedSheet[];
};
