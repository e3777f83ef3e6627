import type { TicketPriority } from "@/content-schema/ticket-status";
import type { VendorSettings } from "@/content-schema/vendor";

/** When the first staff reply is due: the vendor's target hours for the priority after creation. */
export function firstResponseDueAt(createdAt: Date, priority: TicketPriority, settings: Pick<VendorSettings, "firstResponseHours">): Date {
  return new Date(createdAt.getTime() + settings.firstResponseHours[priority] * 3_600_000);
}
