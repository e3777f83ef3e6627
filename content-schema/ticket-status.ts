import { z } from "zod";

export const TICKET_STATUSES = ["new", "in_progress", "waiting_on_customer", "answered", "closed"] as const;
export const ticketStatusSchema = z.enum(TICKET_STATUSES);
export type TicketStatus = z.infer<typeof ticketStatusSchema>;
export const ticketStatusLabels: Record<TicketStatus, string> = {
  new: "New",
  in_progress: "In progress",
  waiting_on_customer: "Waiting on customer",
  answered: "Answered",
  closed: "Closed",
};

export const TICKET_PRIORITIES = ["low", "normal", "high", "urgent"] as const;
export const ticketPrioritySchema = z.enum(TICKET_PRIORITIES);
export type TicketPriority = z.infer<typeof ticketPrioritySchema>;
export const ticketPriorityLabels: Record<TicketPriority, string> = { low: "Low", normal: "Normal", high: "High", urgent: "Urgent" };

export const messageVisibilitySchema = z.enum(["public", "note"]);
export type MessageVisibility = z.infer<typeof messageVisibilitySchema>;
