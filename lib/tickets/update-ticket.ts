import "server-only";

import type { Knex } from "knex";

import { panelValuesOf, type TicketPanelValues, type TicketUpdateInput } from "@/content-schema/ticket-update";
import type { Vendor } from "@/content-schema/vendor";
import { db } from "@/lib/db/knex";
import { Conflict, InvalidInput, NotFound } from "@/lib/errors/domain-errors";

import { auditTicketChange } from "./audit-change";
import { firstResponseDueAt } from "./first-response-due";

type Row = {
  status: string;
  priority: string;
  assignee_id: string | null;
  tags: string[];
  created_at: Date;
  first_response_at: Date | null;
};

async function assertAssignable(trx: Knex, vendorId: string, userId: string) {
  const ok = await trx("members").where({ vendor_id: vendorId, user_id: userId }).whereIn("role", ["support", "admin"]).first("id");
  if (!ok) throw new InvalidInput("Please correct the marked fields.", { assigneeId: ["Choose a member of the support team."] });
}

const fieldWords: Record<keyof TicketPanelValues, string> = {
  status: "status",
  priority: "priority",
  assigneeId: "assignee",
  tags: "tags",
};

/** Refuses a change to a field someone else changed since the editor loaded it, so nobody's change is silently undone. */
function assertUnchangedSince(row: Row, expected: TicketUpdateInput["expected"]) {
  if (!expected) return;
  const stored = panelValuesOf({ status: row.status, priority: row.priority, assigneeId: row.assignee_id, tags: row.tags });
  const changed = (Object.keys(expected) as (keyof TicketPanelValues)[]).filter(
    (key) => expected[key] !== undefined && expected[key] !== stored[key],
  );
  if (changed.length) {
    const names = changed.map((key) => fieldWords[key]).join(" and ");
    throw new Conflict(
      `Someone else changed the ${names} while you were editing. The panel now shows their values; nothing was saved. Check and save again.`,
      { current: stored },
    );
  }
}

async function applyUpdate(
  trx: Knex.Transaction,
  vendor: Vendor,
  actorUserId: string,
  input: TicketUpdateInput,
): Promise<TicketPanelValues> {
  const row = await trx("tickets").where({ id: input.ticketId, vendor_id: vendor.id }).forUpdate().first<Row | undefined>();
  if (!row) throw new NotFound();
  assertUnchangedSince(row, input.expected);
  const patch: Record<string, unknown> = {};
  const audit = (field: "status" | "priority" | "assignee" | "tags", from: unknown, to: unknown) =>
    auditTicketChange(trx, { vendorId: vendor.id, actorUserId, ticketId: input.ticketId, field, from, to });

  if (input.status && input.status !== row.status) {
    patch.status = input.status;
    patch.closed_at = input.status === "closed" ? trx.fn.now() : null;
    await audit("status", row.status, input.status);
  }
  if (input.priority && input.priority !== row.priority) {
    patch.priority = input.priority;
    // The target follows the priority until someone has answered.
    if (!row.first_response_at) patch.first_response_due_at = firstResponseDueAt(new Date(row.created_at), input.priority, vendor.settings);
    await audit("priority", row.priority, input.priority);
  }
  if (input.assigneeId !== undefined) {
    const next = input.assigneeId || null;
    if (next !== row.assignee_id) {
      if (next) await assertAssignable(trx, vendor.id, next);
      patch.assignee_id = next;
      await audit("assignee", row.assignee_id, next);
    }
  }
  if (input.tags && input.tags.join(",") !== row.tags.join(",")) {
    patch.tags = input.tags;
    await audit("tags", row.tags, input.tags);
  }
  if (Object.keys(patch).length)
    await trx("tickets")
      .where({ id: input.ticketId, vendor_id: vendor.id })
      .update({ ...patch, updated_at: trx.fn.now() });
  const saved = { ...row, ...patch } as Row;
  return panelValuesOf({ status: saved.status, priority: saved.priority, assigneeId: saved.assignee_id, tags: saved.tags });
}

/**
 * A staff change to status, priority, assignee or tags; each changed field is audited.
 * Answers with the ticket's values as saved, for the panel to show.
 */
export async function updateTicket({
  vendor,
  actorUserId,
  input,
}: {
  vendor: Vendor;
  actorUserId: string;
  input: TicketUpdateInput;
}): Promise<TicketPanelValues> {
  return db.transaction((trx) => applyUpdate(trx, vendor, actorUserId, input));
}

/** Assigns many tickets at once (the queue's bulk action), audited per ticket. */
export async function bulkAssign({
  vendor,
  actorUserId,
  ticketIds,
  assigneeId,
}: {
  vendor: Vendor;
  actorUserId: string;
  ticketIds: string[];
  assigneeId: string;
}): Promise<number> {
  let changed = 0;
  await db.transaction(async (trx) => {
    for (const ticketId of ticketIds) {
      const exists = await trx("tickets").where({ id: ticketId, vendor_id: vendor.id }).first("id");
      if (!exists) continue;
      await applyUpdate(trx, vendor, actorUserId, { ticketId, assigneeId });
      changed += 1;
    }
  });
  return changed;
}
