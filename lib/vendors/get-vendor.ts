import "server-only";

import { cache } from "react";

import { db } from "@/lib/db/knex";
import { safeDecode } from "@/lib/http/safe-decode";

import { vendorSlugSchema } from "./reserved-slugs";
import { type Vendor, vendorSettingsSchema } from "./vendor-schema";

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

/** The vendor named by a route segment, or null (reserved or malformed slugs never reach the database). */
export const getVendorBySlug = cache(async (slug: string): Promise<Vendor | null> => {
  const parsed = vendorSlugSchema.safeParse(safeDecode(slug));
  if (!parsed.success) return null;
  const row = await db("vendors")
    .select("id", "slug", "name", "accent_color", "settings", db.raw("logo is not null as has_logo"))
    .where({ slug: parsed.data })
    .first<VendorRow | undefined>();
  return row ? toVendor(row) : null;
});

export async function listVendors(): Promise<Vendor[]> {
  const rows = await db("vendors")
    .select("id", "slug", "name", "accent_color", "settings", db.raw("logo is not null as has_logo"))
    .orderBy("name");
  return rows.map(toVendor);
}
