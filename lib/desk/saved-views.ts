import "server-only";

import { db } from "@/lib/db/knex";

import { applyQueueFilters } from "./list-queue";
import { parseQueueFilters, type QueueFilters } from "./queue-filters";
import { VIEW_COUNT_CAP } from "./view-count";

/** `count` stops one past VIEW_COUNT_CAP (lib/desk/view-count.ts). */
export type DeskView = { id: string; name: string; filters: QueueFilters; builtIn: boolean; count: number };

const BUILT_IN: { id: string; name: string; filters: QueueFilters }[] = [
  { id: "open", name: "All open", filters: {} },
  { id: "mine", name: "Assigned to me", filters: { assignee: "me" } },
  { id: "unassigned", name: "Unassigned", filters: { assignee: "none" } },
  { id: "overdue", name: "Overdue", filters: { overdue: true } },
];

async function countFor(vendorId: string, userId: string, filters: QueueFilters): Promise<number> {
  const capped = applyQueueFilters(db("tickets as t").where("t.vendor_id", vendorId), filters, userId)
    .select(db.raw("1"))
    .limit(VIEW_COUNT_CAP + 1);
  const row = await db.from(capped.as("capped")).count<{ count: string }[]>("* as count").first();
  return Number(row?.count ?? 0);
}

/** The built-in views and this agent's saved views, each with its ticket count. */
export async function listDeskViews({ vendorId, userId }: { vendorId: string; userId: string }): Promise<DeskView[]> {
  const saved = await db("desk_views").where({ vendor_id: vendorId, user_id: userId }).orderBy("name").select("id", "name", "filters");
  const all = [
    ...BUILT_IN.map((v) => ({ ...v, builtIn: true })),
    ...saved.map((v) => ({ id: v.id, name: v.name, filters: parseQueueFilters(v.filters), builtIn: false })),
  ];
  return Promise.all(all.map(async (v) => ({ ...v, count: await countFor(vendorId, userId, v.filters) })));
}

/** Saves (or replaces, by name) one of this agent's views. */
export async function saveDeskView({
  vendorId,
  userId,
  name,
  filters,
}: {
  vendorId: string;
  userId: string;
  name: string;
  filters: QueueFilters;
}): Promise<{ id: string }> {
  const [row] = await db("desk_views")
    .insert({ vendor_id: vendorId, user_id: userId, name, filters: JSON.stringify(filters) })
    .onConflict(["vendor_id", "user_id", "name"])
    .merge({ filters: JSON.stringify(filters) })
    .returning<{ id: string }[]>("id");
  return row;
}

export async function deleteDeskView({ vendorId, userId, viewId }: { vendorId: string; userId: string; viewId: string }): Promise<void> {
  await db("desk_views").where({ id: viewId, vendor_id: vendorId, user_id: userId }).delete();
}
