import { randomUUID } from "node:crypto";

import { sheetFrontMatterSchema } from "@/content-schema/sheet-front-matter";
import { db } from "@/lib/db/knex";
import { createTicket } from "@/lib/tickets/create-ticket";
import { toVendor } from "@/lib/vendors/get-vendor";
import type { Vendor } from "@/lib/vendors/vendor-schema";

import { uniq } from "./foundation";
import { buildSheetSource, frontMatterInput } from "./sheet-source";

export async function loadVendor(vendorId: string): Promise<Vendor> {
  const row = await db("vendors").where({ id: vendorId }).first("id", "slug", "name", "accent_color", "settings", db.raw("logo is not null as has_logo"));
  return toVendor(row);
}

/** A cutter, a material, a machine class and a published sheet version of one vendor. Invented demo data. */
export async function createPublishedSheet(vendorId: string, authorId: string | null = null) {
  const [cutter] = await db("cutters")
    .insert({ vendor_id: vendorId, sku: uniq("SF"), name: "Single-flute O-flute 1/8 in", diameter_mm: 3.175, flutes: 1, flute_length_mm: 12, overall_length_mm: 38, shank_mm: 3.175, geometry: "o-flute", short_code: uniq("c") })
    .returning("id");
  const [material] = await db("materials")
    .insert({ vendor_id: vendorId, slug: uniq("acrylic"), name: "Cast acrylic", material_group: "plastics", vc_min_mpm: 150, vc_max_mpm: 300, min_chip_load_mm: 0.05, kc_nmm2: 100 })
    .returning("id");
  const [machineClass] = await db("machine_classes")
    .insert({ vendor_id: vendorId, slug: uniq("router"), name: "Rigid router", rpm_min: 8000, rpm_max: 24000, power_kw: 2.2, max_feed_mm_min: 10000, rigidity: 0.8 })
    .returning("id");
  const [sheet] = await db("sheets")
    .insert({ vendor_id: vendorId, slug: uniq("sheet"), cutter_id: cutter.id, material_id: material.id, machine_class_id: machineClass.id, created_by: authorId })
    .returning(["id", "slug"]);
  const frontMatter = sheetFrontMatterSchema.parse(frontMatterInput());
  const [version] = await db("sheet_versions")
    .insert({ vendor_id: vendorId, sheet_id: sheet.id, number: 1, state: "published", title: frontMatter.title, source: buildSheetSource(), front_matter: JSON.stringify(frontMatter), published_at: db.fn.now() })
    .returning(["id", "title"]);
  return { cutterId: cutter.id as string, materialId: material.id as string, sheetId: sheet.id as string, sheetSlug: sheet.slug as string, versionId: version.id as string, title: version.title as string };
}

/** A light router of one customer (slower spindle and less rigid than the sheet's class). Invented demo data. */
export async function createMachine(vendorId: string, userId: string, overrides: Record<string, unknown> = {}) {
  const [row] = await db("machines")
    .insert({ vendor_id: vendorId, user_id: userId, name: "Desk router", rpm_min: 10000, rpm_max: 16000, power_kw: 0.8, max_feed_mm_min: 3000, rigidity: 0.4, stickout_mm: 15, ...overrides })
    .returning(["id", "name"]);
  return row as { id: string; name: string };
}

export async function openTicket(vendorId: string, customerId: string, overrides: Record<string, unknown> = {}) {
  const vendor = await loadVendor(vendorId);
  return createTicket({
    vendor,
    customerId,
    input: { subject: "Chips weld in the slot", body: "The cutter melts the acrylic.", idempotencyKey: randomUUID(), attachmentIds: [], ...overrides },
  });
}
