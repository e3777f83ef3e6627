import "server-only";

import type { Knex } from "knex";
import { cache } from "react";

import { vendorSettingsSchema, type Vendor } from "@/content-schema/vendor";
import { db } from "@/lib/db/knex";
import { safeDecode } from "@/lib/http/safe-decode";

import { vendorSlugSchema } from "./reserved-slugs";

type VendorRow = { id: string; slug: string; name: string; accent_color: string; has_logo: boolean; settings: unknown };

export function toVendor(row: VendorRow): Vendor {
  return {
    id: row.id,
    slug: row.slug,
    name: row.name,
    accentColor: row.accent_color,
    hasLogo: row.has_logo,
    settings: vendorSettingsSchema.parse(row.settings ?? {}),
  };
}

/** The vendor columns `toVendor` reads; the caller adds the WHERE clause. */
export const vendorQuery = (trx: Knex = db) =>
  trx("vendors").select<VendorRow[]>("id", "slug", "name", "accent_color", "settings", trx.raw("logo is not null as has_logo"));

/** The vendor named by a route segment, or null (reserved or malformed slugs never reach the database). */
export const findVendorBySlug = cache(async (slug: string): Promise<Vendor | null> => {
  const parsed = vendorSlugSchema.safeParse(safeDecode(slug));
  if (!parsed.success) return null;
  const row = await vendorQuery().where({ slug: parsed.data }).first();
  return row ? toVendor(row) : null;
});

export async function listVendors(): Promise<Vendor[]> {
  const rows = await vendorQuery().orderBy("name");
  return rows.map(toVendor);
}
