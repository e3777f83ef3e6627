import "server-only";

import type { ChangeableParam } from "@/content-schema/outcome-fields";
import { operationKindLabels } from "@/content-schema/sheet-kinds";
import { readStoredOperations } from "@/lib/adapt/read-front-matter";
import { db } from "@/lib/db/knex";
import { Conflict, NotFound } from "@/lib/errors/domain-errors";
import { findOpenDraft, getSheet } from "@/lib/sheets/find-sheet";
import { startNewVersionIn } from "@/lib/sheets/start-new-version";

import { checkChangedOperation } from "./check-changed-operation";
import { replaceOperationValue, scaleOperationValue, suggestionChangeNote } from "./suggested-change";
import { wilsonInterval } from "./wilson";

type Options = {
  vendorId: string;
  userId: string;
  versionId: string;
  operationIndex: number;
  param: ChangeableParam;
  /** The vendor's confidence level, for the failure interval the note cites. */
  z: number;
  confidenceLabel: string;
};

/** The draft a suggestion opened, or started: the slug and number for the editor, and whether it already existed. */
export type DraftFromChange = { slug: string; number: number; existing: boolean };

/**
 * "Start a draft from this": a new draft version of the sheet with the median change customers reported for one
 * parameter of one operation applied to that operation, and a change note citing the reports. Every number comes
 * from the rollups and the stored version, never from the request. Clicked again while that draft is open, it
 * answers the same draft; any other open draft is a conflict (one open draft per sheet, as in the editor).
 */
export async function startDraftFromChange({
  vendorId,
  userId,
  versionId,
  operationIndex,
  param,
  z,
  confidenceLabel,
}: Options): Promise<DraftFromChange> {
  return db.transaction(async (trx) => {
    const version = await trx("sheet_versions as v")
      .join("sheets as s", function () {
        this.on("s.id", "v.sheet_id").andOn("s.vendor_id", "v.vendor_id");
      })
      .where({ "v.vendor_id": vendorId, "v.id": versionId })
      .first("v.id", "v.number", "v.state", "v.source", "v.front_matter", "s.slug");
    if (!version) throw new NotFound("No such sheet version.");
    const sheet = await getSheet({ vendorId, slug: version.slug, trx, lock: true });
    const origin = { fromField: { versionId, operationIndex, param } };

    const open = await findOpenDraft({ vendorId, sheetId: sheet.id, trx });
    if (open) {
      const same = await trx("audit_log")
        .where({ vendor_id: vendorId, action: "sheet.new_version", object_type: "sheet_version", object_id: open.id })
        .whereRaw("details @> ?::jsonb", [JSON.stringify(origin)])
        .first("id");
      if (same) return { slug: sheet.slug, number: open.number, existing: true };
      throw new Conflict(
        `This sheet already has an open draft (version ${open.number}). Apply the change there by hand, or start from this suggestion once that draft is published.`,
      );
    }
    if (version.state !== "published")
      throw new Conflict(`Version ${version.number} is no longer the published version; suggestions apply to the published version only.`);

    const change = await trx("field_change_rollups")
      .where({ vendor_id: vendorId, sheet_version_id: versionId, operation_index: operationIndex, param })
      .first();
    if (!change) throw new NotFound("No report changed that number of that operation.");
    const medianPct = Number(change.median_pct);
    if (Math.abs(medianPct) < 0.05) throw new Conflict("Customers' median change is zero: there is nothing to apply.");
    const rollup = await trx("field_version_rollups")
      .where({ vendor_id: vendorId, sheet_version_id: versionId })
      .first("outcomes", "failed");

    const op = readStoredOperations(version.front_matter)[operationIndex];
    if (!op) throw new NotFound(`Version ${version.number} has no operation ${operationIndex + 1}.`);
    const value = scaleOperationValue(op, param, 1 + medianPct / 100);
    if (!value)
      throw new Conflict(`“${op.label ?? operationKindLabels[op.kind]}” has no value for that number on version ${version.number}.`);
    if (value.toValue === value.fromValue)
      throw new Conflict("The median change rounds to the sheet's own value: there is nothing to apply.");
    const source = replaceOperationValue(version.source, operationIndex, value.key, value.toText);

    // The engine judges the new numbers of that operation as the sheet would state them.
    const changed = readStoredOperations({ operations: [{ ...op, [value.key]: value.toText }] })[0] ?? op;
    const engine = await checkChangedOperation({ trx, vendorId, sheet, op: changed });

    const outcomes = Number(rollup?.outcomes ?? 0);
    const failed = Number(rollup?.failed ?? 0);
    const changeNote = suggestionChangeNote({
      param,
      operationLabel: op.label ?? operationKindLabels[op.kind],
      versionNumber: version.number,
      reports: Number(change.reports),
      lowered: Number(change.lowered),
      raised: Number(change.raised),
      medianPct,
      q1Pct: Number(change.q1_pct),
      q3Pct: Number(change.q3_pct),
      outcomes,
      failed,
      failure: wilsonInterval(failed, outcomes, z),
      confidenceLabel,
      value,
      engineWarnings: engine.warnings,
      referenceMachine: engine.referenceMachine,
    });
    const created = await startNewVersionIn(trx, { vendorId, userId, slug: sheet.slug, source, changeNote, origin });
    return { slug: sheet.slug, number: created.number, existing: false };
  });
}
