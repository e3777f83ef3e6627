import { z } from "zod";

import { ticketPrioritySchema, ticketStatusSchema } from "@/content-schema/ticket-status";

export const QUEUE_SORTS = ["newest", "oldest", "target"] as const;
export const queueSortLabels: Record<(typeof QUEUE_SORTS)[number], string> = {
  newest: "Newest first",
  oldest: "Oldest first",
  target: "Response target first",
};

const list = <T extends z.ZodType>(item: T) =>
  z.preprocess((v) => (v === undefined || v === "" ? undefined : typeof v === "string" ? v.split(",") : v), z.array(item).optional());

/** Filters of the Desk queue, from a saved view or the query string. Open tickets unless a status is chosen. */
export const queueFiltersSchema = z.object({
  status: list(ticketStatusSchema),
  priority: list(ticketPrioritySchema),
  // "me", "none" or a member's user id.
  assignee: z
    .union([z.literal("me"), z.literal("none"), z.uuid()])
    .optional()
    .catch(undefined),
  tag: z.string().trim().toLowerCase().max(40).optional().catch(undefined),
  materialId: z.uuid().optional().catch(undefined),
  overdue: z.preprocess((v) => v === true || v === "true" || v === "1", z.boolean()).optional(),
  // A ticket number ("42" or "#42") or words of the subject or question.
  q: z.string().trim().max(200).optional().catch(undefined),
  // Newest first unless another order is chosen.
  sort: z.enum(QUEUE_SORTS).optional().catch(undefined),
});
export type QueueFilters = z.infer<typeof queueFiltersSchema>;

export function parseQueueFilters(input: unknown): QueueFilters {
  return queueFiltersSchema.safeParse(input).data ?? {};
}

/** The same filters as a query string, for the SWR key and links. */
export function queueFiltersToSearch(f: QueueFilters): string {
  const p = new URLSearchParams();
  if (f.status?.length) p.set("status", f.status.join(","));
  if (f.priority?.length) p.set("priority", f.priority.join(","));
  if (f.assignee) p.set("assignee", f.assignee);
  if (f.tag) p.set("tag", f.tag);
  if (f.materialId) p.set("materialId", f.materialId);
  if (f.overdue) p.set("overdue", "true");
  if (f.q) p.set("q", f.q);
  if (f.sort && f.sort !== "newest") p.set("sort", f.sort);
  return p.toString();
}
