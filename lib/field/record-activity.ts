import "server-only";

import { db } from "@/lib/db/knex";

export type ActivityKind = "views" | "adaptations";

// A fixed statement per kind: nothing from the caller reaches the SQL text.
const UPSERT: Record<ActivityKind, string> = {
  views: `insert into sheet_version_activity (vendor_id, sheet_version_id, day, views) values (?, ?, current_date, 1)
          on conflict (sheet_version_id, day) do update set views = sheet_version_activity.views + 1`,
  adaptations: `insert into sheet_version_activity (vendor_id, sheet_version_id, day, adaptations) values (?, ?, current_date, 1)
          on conflict (sheet_version_id, day) do update set adaptations = sheet_version_activity.adaptations + 1`,
};

/** One more view or adaptation of a sheet version today: a counter, never who it was. */
export async function recordSheetActivity({
  vendorId,
  versionId,
  kind,
}: {
  vendorId: string;
  versionId: string;
  kind: ActivityKind;
}): Promise<void> {
  // The version must be this vendor's and readable; anything else is dropped without a trace.
  const version = await db("sheet_versions")
    .where({ id: versionId, vendor_id: vendorId })
    .whereIn("state", ["published", "superseded", "withdrawn"])
    .first("id");
  if (!version) return;
  await db.raw(UPSERT[kind], [vendorId, versionId]);
}
