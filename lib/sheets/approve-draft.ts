import "server-only";

import type { Knex } from "knex";

import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { Conflict, Forbidden } from "@/lib/errors/domain-errors";
import { getVendorSettings } from "@/lib/vendors/vendor-settings";

import { lockOpenDraft } from "./find-sheet";

type ApproveOptions = { vendorId: string; userId: string; slug: string };

/** Records the review of a version in review; with requireSecondApproval the author (or last editor) cannot approve. */
export async function approveDraft(options: ApproveOptions) {
  const settings = await getVendorSettings(options.vendorId);
  return db.transaction((trx) => approveDraftIn(trx, { ...options, settings }));
}

/** The approval inside the caller's transaction (a family batch approves all its sheets in one). */
export async function approveDraftIn(
  trx: Knex.Transaction,
  { vendorId, userId, slug, settings }: ApproveOptions & { settings: Awaited<ReturnType<typeof getVendorSettings>> },
) {
  const { draft } = await lockOpenDraft({ vendorId, slug, trx });
  if (draft.state !== "in_review") throw new Conflict("Only a version in review can be approved. Submit the draft first.");
  if (draft.approvedBy) throw new Conflict(`This version is already approved by ${draft.approvedByName ?? "another engineer"}.`);
  if (settings.requireSecondApproval && (draft.authorId === userId || draft.updatedBy === userId)) {
    throw new Forbidden("You wrote or last edited this version; an engineer other than the author must approve it.");
  }
  await trx("sheet_versions")
    .where({ vendor_id: vendorId, id: draft.id })
    .update({ approved_by: userId, approved_at: trx.fn.now(), updated_at: trx.fn.now() });
  await writeAudit(
    {
      vendorId,
      actorUserId: userId,
      action: "sheet.approve",
      objectType: "sheet_version",
      objectId: draft.id,
      details: { slug, number: draft.number },
    },
    trx,
  );
  return { number: draft.number, approved: true };
}
