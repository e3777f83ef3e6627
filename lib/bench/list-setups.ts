import "server-only";

import type { OutcomeResult, OutcomeSymptom } from "@/content-schema/outcome-fields";
import { db } from "@/lib/db/knex";
import { isUuid } from "@/lib/ids/is-uuid";

import { rowToSetup, SETUP_COLUMNS, type Setup } from "./setup-rows";

export type SetupSummary = Setup & {
  machineName: string;
  sheetSlug: string;
  sheetTitle: string;
  versionNumber: number;
  versionState: string;
  /** The sheet's published version number, when it is not this setup's. */
  newerVersionNumber: number | null;
  lastOutcome: { result: OutcomeResult; symptom: OutcomeSymptom | null; createdAt: string } | null;
};

/** A customer's setups in one vendor, newest first, each with its last outcome and any newer version. */
export async function listSetups({
  vendorId,
  userId,
  setupId,
}: {
  vendorId: string;
  userId: string;
  setupId?: string;
}): Promise<SetupSummary[]> {
  const query = db("setups as st")
    .join("machines as m", function () {
      this.on("m.id", "st.machine_id").andOn("m.vendor_id", "st.vendor_id");
    })
    .join("sheet_versions as v", function () {
      this.on("v.id", "st.sheet_version_id").andOn("v.vendor_id", "st.vendor_id");
    })
    .join("sheets as s", "s.id", "v.sheet_id")
    .leftJoin("sheet_versions as cur", function () {
      this.on("cur.sheet_id", "v.sheet_id").andOn("cur.vendor_id", "st.vendor_id").andOnVal("cur.state", "published");
    })
    .joinRaw(
      `left join lateral (select o.result, o.symptom, o.created_at from outcomes o
        where o.setup_id = st.id and o.vendor_id = st.vendor_id order by o.created_at desc limit 1) lo on true`,
    )
    .where({ "st.vendor_id": vendorId, "st.user_id": userId })
    .orderBy("st.created_at", "desc")
    .select([
      ...SETUP_COLUMNS,
      "m.name as machine_name",
      "s.slug as sheet_slug",
      "v.title as sheet_title",
      "v.number as version_number",
      "v.state as version_state",
      "cur.number as current_number",
      "lo.result as lo_result",
      "lo.symptom as lo_symptom",
      "lo.created_at as lo_created_at",
    ]);
  if (setupId) query.andWhere("st.id", setupId);
  const rows = await query;
  return rows.map((row) => ({
    ...rowToSetup(row),
    machineName: row.machine_name,
    sheetSlug: row.sheet_slug,
    sheetTitle: row.sheet_title,
    versionNumber: row.version_number,
    versionState: row.version_state,
    newerVersionNumber: row.current_number !== null && row.current_number > row.version_number ? row.current_number : null,
    lastOutcome: row.lo_result
      ? { result: row.lo_result, symptom: row.lo_symptom, createdAt: new Date(row.lo_created_at).toISOString() }
      : null,
  }));
}

export async function findSetup(options: { vendorId: string; userId: string; setupId: string }): Promise<SetupSummary | null> {
  if (!isUuid(options.setupId)) return null;
  return (await listSetups(options))[0] ?? null;
}
