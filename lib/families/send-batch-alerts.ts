import "server-only";

import { z } from "zod";

import type { AdaptContext } from "@/lib/adapt/adapt-context";
import { findVersionAdaptContext } from "@/lib/adapt/find-version-adapt-context";
import { frontMatterOf, listAlertSetups, reAdapt, type SetupRow } from "@/lib/bench/alert-setups";
import { db } from "@/lib/db/knex";
import { appUrl } from "@/lib/http/app-url";
import { mailFooter, preferencesUrl, withFooter } from "@/lib/mail-preferences/preferences-link";
import { enqueueMail } from "@/lib/mail/enqueue-mail";
import { diffParameters } from "@/lib/sheets/parameter-diff";

import { renderBatchChangeAlert, type BatchAlertSheet } from "./batch-alert-mail";

const jobSchema = z.object({ vendorId: z.uuid(), batchId: z.uuid() });

type Changed = {
  versionId: string;
  previousId: string;
  oldCtx: AdaptContext;
  newCtx: AdaptContext;
  sheet: Omit<BatchAlertSheet, "setups">;
  changeNote: string;
  rows: SetupRow[];
};

async function changedSheets(vendorId: string, batchId: string, vendorSlug: string): Promise<Changed[]> {
  const items = await db("family_batch_items")
    .where({ vendor_id: vendorId, batch_id: batchId, outcome: "new-version" })
    .whereNull("excluded_reason")
    .whereNotNull("previous_version_id")
    .select<{ version_id: string; previous_version_id: string }[]>("version_id", "previous_version_id");
  const changed: Changed[] = [];
  for (const item of items) {
    const rows = await listAlertSetups({ vendorId, supersededVersionId: item.previous_version_id, kind: "batch_changes" });
    if (!rows.length) continue;
    const [newCtx, oldCtx, before, after] = await Promise.all([
      findVersionAdaptContext({ vendorId, versionId: item.version_id }),
      findVersionAdaptContext({ vendorId, versionId: item.previous_version_id }),
      frontMatterOf(vendorId, item.previous_version_id),
      frontMatterOf(vendorId, item.version_id),
    ]);
    if (!newCtx || !oldCtx) continue;
    const versionUrl = appUrl(`/${vendorSlug}/library/${newCtx.sheetSlug}/v/${newCtx.versionNumber}`);
    const sheet = {
      title: newCtx.title,
      oldNumber: oldCtx.versionNumber,
      newNumber: newCtx.versionNumber,
      versionUrl,
      sheetDiff: diffParameters(before.frontMatter, after.frontMatter, newCtx.cutter),
    };
    changed.push({
      versionId: item.version_id,
      previousId: item.previous_version_id,
      oldCtx,
      newCtx,
      sheet,
      changeNote: after.changeNote,
      rows,
    });
  }
  return changed;
}

/**
 * After a batch is published: one e-mail per customer listing every sheet of theirs the batch superseded,
 * re-adapted to their machines. The change_alerts_sent rows of a mail commit with it, so a retry sends none twice.
 */
export async function sendBatchAlerts({ vendorId, batchId }: { vendorId: string; batchId: string }): Promise<number> {
  const batch = await db("family_batches as b")
    .join("families as f", function () {
      this.on("f.id", "b.family_id").andOn("f.vendor_id", "b.vendor_id");
    })
    .join("vendors as ven", "ven.id", "b.vendor_id")
    .where({ "b.vendor_id": vendorId, "b.id": batchId, "b.state": "published" })
    .first<{ family_name: string; vendor_slug: string; vendor_name: string } | undefined>(
      "f.name as family_name",
      "ven.slug as vendor_slug",
      "ven.name as vendor_name",
    );
  if (!batch) return 0;
  const changed = await changedSheets(vendorId, batchId, batch.vendor_slug);
  const byUser = new Map<string, { email: string; units: SetupRow["units"]; sheets: { changed: Changed; rows: SetupRow[] }[] }>();
  for (const c of changed) {
    const perUser = new Map<string, SetupRow[]>();
    for (const row of c.rows) perUser.set(row.user_id, [...(perUser.get(row.user_id) ?? []), row]);
    for (const [userId, rows] of perUser) {
      const entry = byUser.get(userId) ?? { email: rows[0].email, units: rows[0].units, sheets: [] };
      entry.sheets.push({ changed: c, rows });
      byUser.set(userId, entry);
    }
  }
  let sent = 0;
  for (const [userId, entry] of byUser) {
    // Batch mails are their own kind of mail: the stop link opens the preferences page with it picked out.
    const stop = preferencesUrl(batch.vendor_slug, { vendorId, userId }, "batch_changes");
    const mail = withFooter(
      renderBatchChangeAlert({
        vendorName: batch.vendor_name,
        familyName: batch.family_name,
        changeNote: entry.sheets[0].changed.changeNote,
        stopUrl: stop,
        units: entry.units,
        sheets: entry.sheets.map(({ changed: c, rows }) => ({
          ...c.sheet,
          setups: rows.map((r) => reAdapt(c.oldCtx, c.newCtx, r, appUrl(`/${batch.vendor_slug}/bench/setups/${r.id}`))),
        })),
      }),
      mailFooter(batch.vendor_slug, batch.vendor_name, { vendorId, userId }),
    );
    await db.transaction(async (trx) => {
      const rows = entry.sheets.map(({ changed: c, rows: setups }) => ({
        vendor_id: vendorId,
        version_id: c.versionId,
        superseded_version_id: c.previousId,
        user_id: userId,
        setup_count: setups.length,
      }));
      const inserted = await trx("change_alerts_sent").insert(rows).onConflict(["version_id", "user_id"]).ignore().returning("user_id");
      if (!inserted.length) return;
      await enqueueMail(
        trx,
        { to: entry.email, ...mail, headers: { "List-Unsubscribe": `<${stop}>` } },
        { key: `family-alert:${batchId}:${userId}` },
      );
      sent += 1;
    });
  }
  return sent;
}

export async function sendBatchAlertsJob(data: unknown): Promise<void> {
  await sendBatchAlerts(jobSchema.parse(data));
}
