import "server-only";

import { db } from "@/lib/db/knex";
import type { SheetEvent } from "@/lib/events/sheet-events";
import { appUrl } from "@/lib/http/app-url";
import { mailFooter, withFooter } from "@/lib/mail-preferences/preferences-link";
import { enqueueMail } from "@/lib/mail/enqueue-mail";
import { diffParameters } from "@/lib/sheets/parameter-diff";

import { findVersionAdaptContext } from "../adapt/find-version-adapt-context";
import { frontMatterOf, listAlertSetups, reAdapt, type SetupRow } from "./alert-setups";
import { createAlertStopToken } from "./alert-token";
import { renderChangeAlert } from "./change-alert-mail";

/**
 * On a supersession, one e-mail per customer with setups on the old version, re-adapted to their machines.
 * A row in change_alerts_sent per (new version, person) makes a retried job send nothing twice.
 */
export async function sendChangeAlerts(event: SheetEvent): Promise<number> {
  // A family batch sends its own alerts: one mail per customer for the whole batch (lib/families/send-batch-alerts.ts).
  if (event.type !== "version.published" || !event.supersededVersionId || event.batchId) return 0;
  const { vendorId, versionId, supersededVersionId } = event;
  const [newCtx, oldCtx, vendor] = await Promise.all([
    findVersionAdaptContext({ vendorId, versionId }),
    findVersionAdaptContext({ vendorId, versionId: supersededVersionId }),
    db("vendors").where({ id: vendorId }).first("slug", "name"),
  ]);
  if (!newCtx || !oldCtx || !vendor) return 0;
  const rows = await listAlertSetups({ vendorId, supersededVersionId });
  if (!rows.length) return 0;
  const [before, after] = await Promise.all([frontMatterOf(vendorId, supersededVersionId), frontMatterOf(vendorId, versionId)]);
  const sheetDiff = diffParameters(before.frontMatter, after.frontMatter, newCtx.cutter);
  const byUser = new Map<string, SetupRow[]>();
  for (const row of rows) byUser.set(row.user_id, [...(byUser.get(row.user_id) ?? []), row]);
  let sent = 0;
  for (const [userId, setups] of byUser) {
    const units = setups[0].units;
    const mail = withFooter(
      renderChangeAlert({
        vendorName: vendor.name,
        sheetTitle: newCtx.title,
        oldNumber: oldCtx.versionNumber,
        newNumber: newCtx.versionNumber,
        changeNote: after.changeNote,
        versionUrl: appUrl(`/${vendor.slug}/library/${newCtx.sheetSlug}/v/${newCtx.versionNumber}`),
        stopUrl: appUrl(`/api/v1/vendors/${vendor.slug}/setups/alerts/stop?token=${createAlertStopToken({ vendorId, userId })}`),
        units,
        sheetDiff,
        setups: setups.map((s) => reAdapt(oldCtx, newCtx, s, appUrl(`/${vendor.slug}/bench/setups/${s.id}`))),
      }),
      mailFooter(vendor.slug, vendor.name, { vendorId, userId }),
    );
    await db.transaction(async (trx) => {
      const inserted = await trx("change_alerts_sent")
        .insert({
          vendor_id: vendorId,
          version_id: versionId,
          superseded_version_id: supersededVersionId,
          user_id: userId,
          setup_count: setups.length,
        })
        .onConflict(["version_id", "user_id"])
        .ignore()
        .returning("user_id");
      if (!inserted.length) return;
      // The mail job commits with the "sent" row: both or neither. The key makes a second queueing a no-op.
      const stop = appUrl(`/api/v1/vendors/${vendor.slug}/setups/alerts/stop?token=${createAlertStopToken({ vendorId, userId })}`);
      const headers = { "List-Unsubscribe": `<${stop}>`, "List-Unsubscribe-Post": "List-Unsubscribe=One-Click" };
      await enqueueMail(trx, { to: setups[0].email, ...mail, headers }, { key: `change-alert:${versionId}:${userId}` });
      sent += 1;
    });
  }
  return sent;
}
