import "server-only";

import { db } from "@/lib/db/knex";

type Who = { vendorId: string; userId: string };
type Preference = "change_alerts" | "weekly_digest";

async function setPreference({ vendorId, userId }: Who, column: Preference, enabled: boolean): Promise<void> {
  await db("mail_preferences")
    .insert({ vendor_id: vendorId, user_id: userId, [column]: enabled })
    .onConflict(["vendor_id", "user_id"])
    .merge({ [column]: enabled, updated_at: db.fn.now() });
}

// Both e-mails are on unless the person turned them off.
async function wants({ vendorId, userId }: Who, column: Preference): Promise<boolean> {
  const row = await db("mail_preferences").where({ vendor_id: vendorId, user_id: userId }).first(column);
  return row ? Boolean(row[column]) : true;
}

export const setChangeAlerts = ({ enabled, ...who }: Who & { enabled: boolean }) => setPreference(who, "change_alerts", enabled);
export const wantsChangeAlerts = (who: Who) => wants(who, "change_alerts");
export const setWeeklyDigest = ({ enabled, ...who }: Who & { enabled: boolean }) => setPreference(who, "weekly_digest", enabled);
export const wantsWeeklyDigest = (who: Who) => wants(who, "weekly_digest");
