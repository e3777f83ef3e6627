// Invented demo data: reply snippets, one machine per demo customer who has none, and a few tickets.
import { randomUUID } from "node:crypto";
import type { Knex } from "knex";

import type { MachineRow, TicketRow } from "@/lib/db/tables";

import type { SeededIds } from "./seed-foundation";

const SNIPPETS = [
  { title: "Greeting", body: "Hello {{customer.name}},\n\nthank you for ticket #{{ticket.number}}." },
  {
    title: "Adapted sheet attached",
    body: "Below is **{{sheet.title}}** adapted to your {{machine.name}}. Start with the feed override at 80 % and bring it up while you watch the chips.",
  },
  {
    title: "Melting plastics",
    body: "Melting usually means the chip load is too low: the cutter rubs instead of cutting.\n\n- raise the feed or lower the spindle speed\n- clear the chips with air\n- use a single-flute cutter",
  },
  { title: "Sign-off", body: "Best regards,\n{{agent.name}}, {{vendor.name}} support" },
];

// A light router, deliberately weaker than the reference classes (invented demo data).
const DEMO_MACHINE = {
  name: "Belt-drive desk router",
  preset: "light-router",
  rpm_min: 8000,
  rpm_max: 16000,
  power_kw: 0.8,
  max_feed_mm_min: 3000,
  rigidity: 0.4,
  z_thrust_n: 250,
  stickout_mm: 18,
  units: "metric",
} satisfies Partial<MachineRow>;

const TICKETS = [
  {
    vendor: "northbeck",
    customer: "maker@example.test",
    subject: "Chips weld in the slot in cast acrylic",
    body: "At full-width slotting the chips melt back into the slot.\n\n- spindle at the sheet's speed\n- feed lowered because it sounded loud",
    status: "new",
    priority: "high",
    tags: ["melting"],
    sheet: "Cast acrylic%",
  },
  {
    vendor: "northbeck",
    customer: "hobby@example.test",
    subject: "Which entry move for a 6 mm pocket?",
    body: "Plunge or ramp for a pocket in birch ply?",
    status: "answered",
    priority: "normal",
    tags: ["entry"],
    sheet: "Birch plywood%",
  },
  {
    vendor: "quillon",
    customer: "cabinets@example.test",
    subject: "Poor finish on MDF edges",
    body: "Fuzzy edges on a profile pass in MDF.",
    status: "in_progress",
    priority: "normal",
    tags: ["finish"],
    sheet: "MDF%",
  },
] satisfies (Pick<TicketRow, "subject" | "body" | "status" | "priority" | "tags"> & Record<string, unknown>)[];

export async function seedSupport(knex: Knex, ids: SeededIds): Promise<void> {
  for (const vendorId of Object.values(ids.vendors)) {
    for (const s of SNIPPETS)
      await knex("reply_snippets")
        .insert({ vendor_id: vendorId, ...s })
        .onConflict(["vendor_id", "title"])
        .ignore();
  }
  for (const [slug, vendorId] of Object.entries(ids.vendors)) {
    const customers = await knex("members").where({ vendor_id: vendorId, role: "customer" }).pluck("user_id");
    for (const userId of customers) {
      const has = await knex("machines").where({ vendor_id: vendorId, user_id: userId }).first("id");
      if (!has) await knex("machines").insert({ vendor_id: vendorId, user_id: userId, ...DEMO_MACHINE });
    }
    const support = ids.users[`support1@${slug}.test`];
    let number = (await knex("tickets").where({ vendor_id: vendorId }).max({ n: "number" }).first())?.n ?? 0;
    for (const t of TICKETS.filter((x) => x.vendor === slug)) {
      const customerId = ids.users[t.customer];
      if (!customerId) continue;
      const version = await knex("sheet_versions as v")
        .join("sheets as s", "s.id", "v.sheet_id")
        .where({ "v.vendor_id": vendorId, "v.state": "published" })
        .whereILike("v.title", t.sheet)
        .orderBy("v.title")
        .first("v.id", "s.material_id");
      const machine = await knex("machines").where({ vendor_id: vendorId, user_id: customerId }).first("id");
      const created = new Date(Date.now() - 30 * 3_600_000);
      const hours = t.priority === "high" ? 8 : 24;
      const [ticket] = await knex("tickets")
        .insert({
          vendor_id: vendorId,
          number: ++number,
          customer_id: customerId,
          subject: t.subject,
          body: t.body,
          status: t.status,
          priority: t.priority,
          assignee_id: t.status === "new" ? null : support,
          machine_id: machine?.id ?? null,
          material_id: version?.material_id ?? null,
          tags: t.tags,
          idempotency_key: randomUUID(),
          first_response_due_at: new Date(created.getTime() + hours * 3_600_000),
          first_response_at: t.status === "answered" ? new Date(created.getTime() + 3 * 3_600_000) : null,
          created_at: created,
          updated_at: created,
          last_activity_at: created,
        })
        .returning("id");
      if (version)
        await knex("ticket_sheet_links").insert({
          vendor_id: vendorId,
          ticket_id: ticket.id,
          sheet_version_id: version.id,
          machine_id: machine?.id ?? null,
        });
      if (t.status === "answered" && support) {
        await knex("ticket_messages").insert({
          vendor_id: vendorId,
          ticket_id: ticket.id,
          author_id: support,
          visibility: "public",
          body: "A ramp entry at 3° lets the cutter clear chips as it goes down; a straight plunge packs them under the tip.",
          created_at: new Date(created.getTime() + 3 * 3_600_000),
        });
      }
    }
  }
}
