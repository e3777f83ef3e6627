import "server-only";

import type { Knex } from "knex";

import { operationKindLabels } from "@/content-schema/sheet-kinds";
import { readDb } from "@/lib/db/read-db";

import type { ChangeRollup } from "./describe-change";

export type ChangeItem = ChangeRollup & {
  versionId: string;
  sheetSlug: string;
  title: string;
  machineClass: string;
  number: number;
  state: string;
  /** The operation of the reports' setups (0-based) and its name on the sheet. */
  operationIndex: number;
  operationLabel: string;
};

const KIND_LABELS: Record<string, string> = operationKindLabels;
const labelOf = (label: unknown, kind: unknown, index: number) =>
  typeof label === "string" && label ? label : ((typeof kind === "string" ? KIND_LABELS[kind] : undefined) ?? `Operation ${index + 1}`);

const read = (r: Record<string, unknown>): ChangeItem => ({
  versionId: String(r.sheet_version_id),
  sheetSlug: String(r.sheet_slug),
  title: String(r.title),
  machineClass: String(r.machine_class),
  number: Number(r.number),
  state: String(r.state),
  operationIndex: Number(r.operation_index),
  operationLabel: labelOf(r.op_label, r.op_kind, Number(r.operation_index)),
  param: String(r.param),
  reports: Number(r.reports),
  medianPct: Number(r.median_pct),
  q1Pct: Number(r.q1_pct),
  q3Pct: Number(r.q3_pct),
  lowered: Number(r.lowered),
  raised: Number(r.raised),
});

const base = (db: Knex, vendorId: string) =>
  db("field_change_rollups as c")
    .join("sheet_versions as v", function () {
      this.on("v.id", "c.sheet_version_id").andOn("v.vendor_id", "c.vendor_id");
    })
    .join("sheets as s", function () {
      this.on("s.id", "v.sheet_id").andOn("s.vendor_id", "v.vendor_id");
    })
    .join("machine_classes as mc", function () {
      this.on("mc.id", "s.machine_class_id").andOn("mc.vendor_id", "s.vendor_id");
    })
    .where("c.vendor_id", vendorId)
    .select(
      "c.*",
      "v.title",
      "v.number",
      "v.state",
      "s.slug as sheet_slug",
      "mc.name as machine_class",
      db.raw("v.front_matter->'operations'->c.operation_index->>'label' as op_label"),
      db.raw("v.front_matter->'operations'->c.operation_index->>'kind' as op_kind"),
    );

/**
 * Across the published versions: the parameters customers changed most often, as suggestions for the next version.
 * One report is an anecdote, so the vendor-wide list starts at two.
 */
export async function listCustomerChanges({
  vendorId,
  limit = 25,
  minReports = 2,
}: {
  vendorId: string;
  limit?: number;
  minReports?: number;
}): Promise<ChangeItem[]> {
  const rows = await base(await readDb(), vendorId)
    .where("v.state", "published")
    .where("c.reports", ">=", minReports)
    .orderBy([{ column: "c.reports", order: "desc" }, { column: "s.slug" }, { column: "c.operation_index" }, { column: "c.param" }])
    .limit(limit);
  return rows.map(read);
}

/** Every version of one sheet. */
export async function listSheetChanges({ vendorId, sheetId }: { vendorId: string; sheetId: string }): Promise<ChangeItem[]> {
  const rows = await base(await readDb(), vendorId)
    .where("v.sheet_id", sheetId)
    .orderBy([
      { column: "v.number", order: "desc" },
      { column: "c.reports", order: "desc" },
      { column: "c.operation_index" },
      { column: "c.param" },
    ]);
  return rows.map(read);
}
