import { randomUUID } from "node:crypto";

import { sheetFrontMatterSchema } from "@/content-schema/sheet-front-matter";
import type { MessageVisibility } from "@/content-schema/ticket-status";
import type { Vendor } from "@/content-schema/vendor";
import { db } from "@/lib/db/knex";
import { createTicket } from "@/lib/tickets/create-ticket";
import { toVendor, vendorQuery } from "@/lib/vendors/get-vendor";

import { insertSheetCatalogue } from "./sheet-catalogue";
import { buildSheetSource, frontMatterInput } from "./sheet-source";

export async function loadVendor(vendorId: string): Promise<Vendor> {
  const row = await vendorQuery().where({ id: vendorId }).first();
  if (!row) throw new Error(`No vendor ${vendorId}`);
  return toVendor(row);
}

/** A cutter, a material, a machine class and a published sheet version of one vendor. Invented demo data. */
export async function createPublishedSheet(vendorId: string, authorId: string | null = null) {
  const { cutter, materialId, sheet } = await insertSheetCatalogue(vendorId, authorId);
  const frontMatter = sheetFrontMatterSchema.parse(frontMatterInput());
  const [version] = await db("sheet_versions")
    .insert({
      vendor_id: vendorId,
      sheet_id: sheet.id,
      number: 1,
      state: "published",
      title: frontMatter.title,
      source: buildSheetSource(),
      front_matter: JSON.stringify(frontMatter),
      published_at: db.fn.now(),
    })
    .returning(["id", "title"]);
  return {
    cutterId: cutter.id,
    materialId,
    sheetId: sheet.id,
    sheetSlug: sheet.slug,
    versionId: version.id as string,
    title: version.title as string,
  };
}

/** A light router of one customer (slower spindle and less rigid than the sheet's class). Invented demo data. */
export async function createMachine(vendorId: string, userId: string, overrides: Record<string, unknown> = {}) {
  const [row] = await db("machines")
    .insert({
      vendor_id: vendorId,
      user_id: userId,
      name: "Desk router",
      rpm_min: 10000,
      rpm_max: 16000,
      power_kw: 0.8,
      max_feed_mm_min: 3000,
      rigidity: 0.4,
      stickout_mm: 15,
      ...overrides,
    })
    .returning(["id", "name"]);
  return row as { id: string; name: string };
}

export async function openTicket(vendorId: string, customerId: string, overrides: Record<string, unknown> = {}) {
  const vendor = await loadVendor(vendorId);
  return createTicket({
    vendor,
    customerId,
    input: {
      subject: "Chips weld in the slot",
      body: "The cutter melts the acrylic.",
      idempotencyKey: randomUUID(),
      attachmentIds: [],
      ...overrides,
    },
  });
}

/**
 * A long thread in one insert: `Message 1` … `Message n`, a second apart in that order, alternating customer and
 * support. `note` picks the 1-based positions written as internal notes.
 */
export async function insertThreadMessages(
  ids: { vendorId: string; ticketId: string; customerId: string; supportId: string },
  count: number,
  note: (n: number) => boolean = () => false,
) {
  const start = Date.now() - count * 1000;
  const rows = Array.from({ length: count }, (_, i) => {
    const visibility: MessageVisibility = note(i + 1) ? "note" : "public";
    return {
      vendor_id: ids.vendorId,
      ticket_id: ids.ticketId,
      author_id: i % 2 ? ids.supportId : ids.customerId,
      visibility,
      body: `Message ${i + 1}`,
      created_at: new Date(start + i * 1000),
    };
  });
  return db("ticket_messages").insert(rows).returning<{ id: string; body: string }[]>(["id", "body"]);
}
