import "server-only";

import { db } from "@/lib/db/knex";

export async function setChangeAlerts({ vendorId, userId, enabled }: { vendorId: string; userId: string; enabled: boolean }): Promise<void> {
  await db("mail_preferences")
    .insert({ vendor_id: vendorId, user_id: userId, change_alerts: enabled })
    .onConflict(["vendor_id", "user_id"])
    .merge({ change_alerts: enabled, updated_at: db.fn.now() });
}

/** Change alerts are on unless the person turned them off. */
export async function wantsChangeAlerts({ vendorId, userId }: { vendorId: string; userId: string }): Promise<boolean> {
  const row = await db("mail_preferences").where({ vendor_id: vendorId, user_id: userId }).first("change_alerts");
  return row ? Boolean(row.change_alerts) : true;
}
