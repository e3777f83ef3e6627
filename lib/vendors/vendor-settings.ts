import "server-only";

import { vendorSettingsSchema, type VendorSettings } from "@/content-schema/vendor";
import { db } from "@/lib/db/knex";
import { NotFound } from "@/lib/errors/domain-errors";

/** A vendor's settings by id (the use cases get ids, not slugs). */
export async function getVendorSettings(vendorId: string): Promise<VendorSettings> {
  const row = await db("vendors").where({ id: vendorId }).first<{ settings: unknown } | undefined>("settings");
  if (!row) throw new NotFound();
  return vendorSettingsSchema.parse(row.settings ?? {});
}
