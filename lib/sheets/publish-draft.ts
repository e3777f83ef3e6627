import "server-only";

import type { Knex } from "knex";

import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { Conflict } from "@/lib/errors/domain-errors";
import { emitSheetEvent } from "@/lib/events/emit-sheet-event";
import { getVendorSettings } from "@/lib/vendors/vendor-settings";

import { lockOpenDraft } from "./find-sheet";

type VendorSettings = Awaited<ReturnType<typeof getVendorSettings>>;
type PublishOptions = { vendorId: string; userId: string; slug: string };

/** in_review → published; the previously published version becomes superseded in the same transaction. */
export async function publishDraft(options: PublishOptions) {
  const settings = await getVendorSettings(options.vendorId);
  return db.transaction((trx) => publishDraftIn(trx, { ...options, settings }));
}

/**
 * A version a family batch wrote is reviewed and published with its batch, all or nothing: published alone, it
 * would skip the batch's review and leave the batch unable to publish. Left out of the batch, it is the sheet's own.
 */
async function refuseIfInOpenBatch(trx: Knex.Transaction, vendorId: string, versionId: string) {
  const open = await trx("family_batch_items as i")
    .join("family_batches as b", function () {
      this.on("b.id", "i.batch_id").andOn("b.vendor_id", "i.vendor_id");
    })
    .join("families as f", function () {
      this.on("f.id", "b.family_id").andOn("f.vendor_id", "b.vendor_id");
    })
    .where({ "i.vendor_id": vendorId, "i.version_id": versionId })
    .whereNull("i.excluded_reason")
    .whereIn("b.state", ["generating", "in_review", "approved"])
    .first<{ number: number; name: string } | undefined>("b.number", "f.name");
  if (open)
    throw new Conflict(
      `This version belongs to batch ${open.number} of the family “${open.name}”: publish it with its batch, or leave it out of the batch first.`,
    );
}

/**
 * The publish step inside the caller's transaction (a family batch publishes all its sheets in one). `batchId`
 * marks the event so the batch sends one change alert per customer instead of one per sheet.
 */
export async function publishDraftIn(
  trx: Knex.Transaction,
  { vendorId, userId, slug, settings, batchId }: PublishOptions & { settings: VendorSettings; batchId?: string },
) {
  const { sheet, draft } = await lockOpenDraft({ vendorId, slug, trx });
  if (draft.state !== "in_review") throw new Conflict("Only a version in review can be published. Submit the draft first.");
  if (settings.requireSecondApproval && !draft.approvedBy)
    throw new Conflict("This version needs an approval by an engineer other than the author before it is published.");
  if (!batchId) await refuseIfInOpenBatch(trx, vendorId, draft.id);
  const superseded = await trx("sheet_versions")
    .where({ vendor_id: vendorId, sheet_id: sheet.id, state: "published" })
    .update({ state: "superseded", superseded_at: trx.fn.now(), updated_at: trx.fn.now() })
    .returning(["id", "number"]);
  await trx("sheet_versions")
    .where({ vendor_id: vendorId, id: draft.id })
    .update({ state: "published", published_at: trx.fn.now(), updated_at: trx.fn.now() });
  await trx("sheets").where({ vendor_id: vendorId, id: sheet.id }).update({ updated_at: trx.fn.now() });
  const previous = superseded[0] as { id: string; number: number } | undefined;
  await writeAudit(
    {
      vendorId,
      actorUserId: userId,
      action: "sheet.publish",
      objectType: "sheet_version",
      objectId: draft.id,
      details: { slug, number: draft.number, supersedes: previous?.number ?? null },
    },
    trx,
  );
  if (previous) {
    await writeAudit(
      {
        vendorId,
        actorUserId: userId,
        action: "sheet.supersede",
        objectType: "sheet_version",
        objectId: previous.id,
        details: { slug, number: previous.number, by: draft.number },
      },
      trx,
    );
  }
  await emitSheetEvent(trx, {
    type: "version.published",
    vendorId,
    sheetId: sheet.id,
    versionId: draft.id,
    supersededVersionId: previous?.id ?? null,
    ...(batchId ? { batchId } : {}),
  });
  return {
    number: draft.number,
    state: "published" as const,
    superseded: previous?.number ?? null,
    versionId: draft.id,
    previousVersionId: previous?.id ?? null,
    sheetId: sheet.id,
  };
}
