import "server-only";

import type { SheetFrontMatter } from "@/content-schema/sheet-front-matter";
import { db } from "@/lib/db/knex";
import type { SheetEvent } from "@/lib/events/sheet-events";
import { appUrl } from "@/lib/http/app-url";
import { enqueueMail } from "@/lib/mail/enqueue-mail";
import type { EntryCapability, UnitSystem } from "@/lib/machining";
import { NotFound } from "@/lib/errors/domain-errors";
import { diffParameters } from "@/lib/sheets/parameter-diff";
import { hasFrontMatter } from "@/lib/sheets/version-rows";

import type { AdaptContext } from "@/lib/adapt/adapt-context";
import { createAlertStopToken } from "./alert-token";
import { type AlertSetup, renderChangeAlert } from "./change-alert-mail";
import { loadAdaptContext } from "@/lib/adapt/load-adapt-context";
import { machineToInput, rowToMachine } from "./machine-rows";
import { readaptOperation } from "@/lib/adapt/readapt-operation";
import { readStoredOperations } from "@/lib/adapt/read-front-matter";

type SetupRow = { id: string; user_id: string; email: string; name: string; operation_index: number; overrides: Record<string, number>; units: UnitSystem; entry_capability: EntryCapability } & Parameters<typeof rowToMachine>[0] & { machine_name: string };

function reAdapt(oldContext: AdaptContext, newContext: AdaptContext, row: SetupRow, setupUrl: string): AlertSetup {
  const base = { setupName: row.name, machineName: row.machine_name, operationLabel: oldContext.operations[row.operation_index]?.label ?? "operation", setupUrl };
  const machine = machineToInput(rowToMachine({ ...row, id: row.id, name: row.machine_name }));
  const setup = { overrides: row.overrides, entryCapability: row.entry_capability, units: row.units };
  const readapted = readaptOperation({ oldContext, newContext, operationIndex: row.operation_index, machine, setup });
  if (!readapted) return { ...base, changes: [], error: "this operation is no longer on the sheet." };
  return { ...base, changes: readapted.changes, error: readapted.error };
}

const frontMatterOf = async (vendorId: string, versionId: string) => {
  const row = await db("sheet_versions").where({ vendor_id: vendorId, id: versionId }).first("front_matter", "change_note");
  if (!row || !hasFrontMatter(row.front_matter)) throw new NotFound("That sheet version has no front matter.");
  const frontMatter: SheetFrontMatter = { ...row.front_matter, operations: readStoredOperations(row.front_matter) };
  return { frontMatter, changeNote: row.change_note };
};

/**
 * On a supersession, one e-mail per customer with setups on the old version, re-adapted to their machines.
 * A row in change_alerts_sent per (new version, person) makes a retried job send nothing twice.
 */
export async function sendChangeAlerts(event: SheetEvent): Promise<number> {
  if (event.type !== "version.published" || !event.supersededVersionId) return 0;
  const { vendorId, versionId, supersededVersionId } = event;
  const [newCtx, oldCtx, vendor] = await Promise.all([
    loadAdaptContext({ vendorId, versionId }),
    loadAdaptContext({ vendorId, versionId: supersededVersionId }),
    db("vendors").where({ id: vendorId }).first("slug", "name"),
  ]);
  if (!newCtx || !oldCtx || !vendor) return 0;
  const rows: SetupRow[] = await db("setups as st")
    .join("machines as m", function () {
      this.on("m.id", "st.machine_id").andOn("m.vendor_id", "st.vendor_id");
    })
    .join("members as mb", function () {
      this.on("mb.user_id", "st.user_id").andOn("mb.vendor_id", "st.vendor_id");
    })
    .join("users as u", "u.id", "st.user_id")
    .leftJoin("mail_preferences as mp", function () {
      this.on("mp.user_id", "st.user_id").andOn("mp.vendor_id", "st.vendor_id");
    })
    .where({ "st.vendor_id": vendorId, "st.sheet_version_id": supersededVersionId })
    .andWhere((q) => q.whereNull("mp.change_alerts").orWhere("mp.change_alerts", true))
    .orderBy(["st.user_id", "st.created_at"])
    .select("st.id", "st.user_id", "u.email", "st.name", "st.operation_index", "st.overrides", "st.units", "st.entry_capability", "m.name as machine_name", "m.preset", "m.rpm_min", "m.rpm_max", "m.power_kw", "m.max_feed_mm_min", "m.rigidity", "m.z_thrust_n", "m.spindle_kind", "m.rated_rpm", "m.stickout_mm", "m.updated_at");
  if (!rows.length) return 0;
  const [before, after] = await Promise.all([frontMatterOf(vendorId, supersededVersionId), frontMatterOf(vendorId, versionId)]);
  const sheetDiff = diffParameters(before.frontMatter, after.frontMatter, newCtx.cutter);
  const byUser = new Map<string, SetupRow[]>();
  for (const row of rows) byUser.set(row.user_id, [...(byUser.get(row.user_id) ?? []), row]);
  let sent = 0;
  for (const [userId, setups] of byUser) {
    const units = setups[0].units;
    const mail = renderChangeAlert({
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
    });
    await db.transaction(async (trx) => {
      const inserted = await trx("change_alerts_sent")
        .insert({ vendor_id: vendorId, version_id: versionId, superseded_version_id: supersededVersionId, user_id: userId, setup_count: setups.length })
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
