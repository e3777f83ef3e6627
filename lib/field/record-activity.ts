import "server-only";

import { db } from "@/lib/db/knex";

export type ActivityKind = "views" | "adaptations";

/** One more view or adaptation of a sheet version today: a counter, never who it was. */
export async function recordSheetActivity({ vendorId, versionId, kind }: { vendorId: string; versionId: string; kind: ActivityKind }): Promise<void> {
  // The version must be this vendor's and readable; anything else is dropped without a trace.
  const version = await db("sheet_versions").where({ id: versionId, vendor_id: vendorId }).whereIn("state", ["published", "superseded", "withdrawn"]).first("id");
  if (!version) return;
  await db.raw(
    `insert into sheet_version_activity (vendor_id, sheet_version_id, day, ${kind}) values (?, ?, current_date, 1)
     on conflict (sheet_version_id, day) do update set ${kind} = sheet_version_activity.${kind} + 1`,
    [vendorId, versionId],
  );
}
