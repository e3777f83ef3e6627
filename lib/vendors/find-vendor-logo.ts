import "server-only";

import { db } from "@/lib/db/knex";

export async function findVendorLogo({ vendorId }: { vendorId: string }): Promise<{ bytes: Buffer; type: string } | null> {
  const row = await db("vendors")
    .where({ id: vendorId })
    .whereNotNull("logo")
    .first<{ logo: Buffer; logo_type: string } | undefined>("logo", "logo_type");
  return row ? { bytes: row.logo, type: row.logo_type } : null;
}
