import "server-only";

import type { SheetFrontMatter } from "@/content-schema/sheet-front-matter";
import { db } from "@/lib/db/knex";
import type { SheetEvent } from "@/lib/events/sheet-events";
import { appUrl } from "@/lib/http/app-url";
import { enqueueMail } from "@/lib/mail/enqueue-mail";
import { wantsMailSql } from "@/lib/mail-preferences/mail-preferences";
import { mailFooter, withFooter } from "@/lib/mail-preferences/preferences-link";
import { type EntryCapability, isMachiningInputError, type UnitSystem } from "@/lib/machining";
import { diffParameters } from "@/lib/sheets/parameter-diff";

import { adaptOperation, type AdaptContext } from "./adapt-context";
import { diffAdapted } from "./adapted-diff";
import { createAlertStopToken } from "./alert-token";
import { type AlertSetup, renderChangeAlert } from "./change-alert-mail";
import { loadAdaptContext } from "./load-adapt-context";
import { machineToInput, rowToMachine } from "./machine-rows";
import { readStoredOperations } from "./read-front-matter";

type SetupRow = { id: string; user_id: string; email: string; name: string; operation_index: number; overrides: Record<string, number>; units: UnitSystem; entry_capability: EntryCapability } & Parameters<typeof rowToMachine>[0] & { machine_name: string };

/** The new version's operation for an old one: same kind and label, else the same position. */
function matchOperation(oldCtx: AdaptContext, newCtx: AdaptContext, index: number): number | null {
  const old = oldCtx.operations[index];
  if (!old) return null;
  const same = newCtx.operations.find((op) => op.kind === old.kind && op.label === old.label);
  return same?.index ?? (newCtx.operations[index]?.kind === old.kind ? index : null);
}

function reAdapt(oldCtx: AdaptContext, newCtx: AdaptContext, row: SetupRow, setupUrl: string): AlertSetup {
  const base = { setupName: row.name, machineName: row.machine_name, operationLabel: oldCtx.operations[row.operation_index]?.label ?? "operation", setupUrl };
  const index = matchOperation(oldCtx, newCtx, row.operation_index);
  if (index === null) return { ...base, changes: [], error: "this operation is no longer on the sheet." };
  try {
    const machine = machineToInput(rowToMachine({ ...row, id: row.id, name: row.machine_name }));
    const next = adaptOperation(newCtx, index, machine, row.overrides, { entryCapability: row.entry_capability, units: row.units });
    // Both versions on the machine as it is now, so the diff shows the sheet's change and nothing else.
    const before = adaptOperation(oldCtx, row.operation_index, machine, row.overrides, { entryCapability: row.entry_capability, units: row.units });
    return { ...base, changes: diffAdapted(before, next), error: null };
  } catch (error) {
    if (!isMachiningInputError(error)) throw error;
    return { ...base, changes: [], error: error.message };
  }
}

const frontMatterOf = async (vendorId: string, versionId: string) => {
  const row = await db("sheet_versions").where({ vendor_id: vendorId, id: versionId }).first("front_matter", "change_note");
  return { frontMatter: { ...row.front_matter, operations: readStoredOperations(row.front_matter) } as SheetFrontMatter, changeNote: String(row.change_note ?? "") };
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
    .where({ "st.vendor_id": vendorId, "st.sheet_version_id": supersededVersionId })
    .andWhere(wantsMailSql("change_alerts", "st.user_id", "st.vendor_id"))
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
    const mail = withFooter(renderChangeAlert({
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
    }), mailFooter(vendor.slug, vendor.name, { vendorId, userId }));
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
