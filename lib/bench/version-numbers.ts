import "server-only";

import { db } from "@/lib/db/knex";

/** Version numbers by version id, for labelling outcome history entries. */
export async function versionNumbers({
  vendorId,
  versionIds,
}: {
  vendorId: string;
  versionIds: string[];
}): Promise<Record<string, number>> {
  if (!versionIds.length) return {};
  const rows = await db("sheet_versions")
    .where({ vendor_id: vendorId })
    .whereIn("id", [...new Set(versionIds)])
    .select("id", "number");
  return Object.fromEntries(rows.map((r) => [r.id, r.number]));
}
