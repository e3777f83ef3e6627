import "server-only";

import type { Knex } from "knex";

import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { Conflict } from "@/lib/errors/domain-errors";

import { lockOpenDraft } from "./find-sheet";

type ReturnOptions = { vendorId: string; userId: string; slug: string; reason?: string };

/** in_review → draft, so it can be edited again; any approval is dropped. */
export async function returnToDraft(options: ReturnOptions) {
  return db.transaction((trx) => returnToDraftIn(trx, options));
}

/** The same inside the caller's transaction (a family batch returns the sheets its reviewer left out). */
export async function returnToDraftIn(trx: Knex.Transaction, { vendorId, userId, slug, reason = "" }: ReturnOptions) {
  const { draft } = await lockOpenDraft({ vendorId, slug, trx });
  if (draft.state !== "in_review") throw new Conflict("This version is not in review.");
  await trx("sheet_versions")
    .where({ vendor_id: vendorId, id: draft.id })
    .update({
      state: "draft",
      submitted_at: null,
      approved_by: null,
      approved_at: null,
      revision: trx.raw("revision + 1"),
      updated_at: trx.fn.now(),
    });
  await writeAudit(
    {
      vendorId,
      actorUserId: userId,
      action: "sheet.return_to_draft",
      objectType: "sheet_version",
      objectId: draft.id,
      details: { slug, number: draft.number, reason },
    },
    trx,
  );
  return { number: draft.number, state: "draft" as const };
}
