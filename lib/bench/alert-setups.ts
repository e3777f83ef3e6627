import "server-only";

import type { AdaptContext } from "@/lib/adapt/adapt-context";
import { readaptOperation } from "@/lib/adapt/readapt-operation";
import { db } from "@/lib/db/knex";
import { NotFound } from "@/lib/errors/domain-errors";
import type { EntryCapability, UnitSystem } from "@/lib/machining";
import { wantsMailSql } from "@/lib/mail-preferences/mail-preferences";
import { storedFrontMatter } from "@/lib/sheets/version-rows";

import type { AlertSetup } from "./change-alert-mail";
import { machineToInput, rowToMachine } from "./machine-rows";

// What a change alert needs about the setups saved from a superseded version: shared by the per-sheet alert and
// the one-mail-per-customer alert of a family batch.

export type SetupRow = {
  id: string;
  user_id: string;
  email: string;
  name: string;
  operation_index: number;
  overrides: Record<string, number>;
  units: UnitSystem;
  entry_capability: EntryCapability;
} & Parameters<typeof rowToMachine>[0] & { machine_name: string };

export function reAdapt(oldContext: AdaptContext, newContext: AdaptContext, row: SetupRow, setupUrl: string): AlertSetup {
  const base = {
    setupName: row.name,
    machineName: row.machine_name,
    operationLabel: oldContext.operations[row.operation_index]?.label ?? "operation",
    setupUrl,
  };
  const machine = machineToInput(rowToMachine({ ...row, id: row.id, name: row.machine_name }));
  const setup = { overrides: row.overrides, entryCapability: row.entry_capability, units: row.units };
  const readapted = readaptOperation({ oldContext, newContext, operationIndex: row.operation_index, machine, setup });
  if (!readapted) return { ...base, changes: [], error: "this operation is no longer on the sheet." };
  return { ...base, changes: readapted.changes, error: readapted.error };
}

export const frontMatterOf = async (vendorId: string, versionId: string) => {
  const row = await db("sheet_versions").where({ vendor_id: vendorId, id: versionId }).first("front_matter", "change_note");
  const frontMatter = row ? storedFrontMatter(row.front_matter) : null;
  if (!row || !frontMatter) throw new NotFound("That sheet version has no front matter.");
  return { frontMatter, changeNote: row.change_note };
};

/** Setups saved from a version, of customers who still take this kind of mail, ordered by person. */
export async function listAlertSetups({
  vendorId,
  supersededVersionId,
  kind = "change_alerts",
}: {
  vendorId: string;
  supersededVersionId: string;
  kind?: "change_alerts" | "batch_changes";
}): Promise<SetupRow[]> {
  return db("setups as st")
    .join("machines as m", function () {
      this.on("m.id", "st.machine_id").andOn("m.vendor_id", "st.vendor_id");
    })
    .join("members as mb", function () {
      this.on("mb.user_id", "st.user_id").andOn("mb.vendor_id", "st.vendor_id");
    })
    .join("users as u", "u.id", "st.user_id")
    .where({ "st.vendor_id": vendorId, "st.sheet_version_id": supersededVersionId })
    .andWhere(wantsMailSql(kind, "st.user_id", "st.vendor_id"))
    .orderBy(["st.user_id", "st.created_at"])
    .select(
      "st.id",
      "st.user_id",
      "u.email",
      "st.name",
      "st.operation_index",
      "st.overrides",
      "st.units",
      "st.entry_capability",
      "m.name as machine_name",
      "m.preset",
      "m.rpm_min",
      "m.rpm_max",
      "m.power_kw",
      "m.max_feed_mm_min",
      "m.rigidity",
      "m.z_thrust_n",
      "m.spindle_kind",
      "m.rated_rpm",
      "m.stickout_mm",
      "m.updated_at",
    );
}
