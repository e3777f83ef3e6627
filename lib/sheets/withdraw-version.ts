import "server-only";

import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { Conflict, InvalidInput, NotFound } from "@/lib/errors/domain-errors";
import { emitSheetEvent } from "@/lib/events/emit-sheet-event";

import { getSheet } from "./find-sheet";

type Options = { vendorId: string; userId: string; slug: string; reason: string; number?: number };

/** published | superseded → withdrawn, with a reason shown to readers. Default: the published version. */
export async function withdrawVersion({ vendorId, userId, slug, reason, number }: Options) {
  const text = reason.trim();
  if (text.length < 5)
    throw new InvalidInput("Withdrawing needs a reason readers will see.", { reason: ["Give readers a reason (at least 5 characters)."] });
  const result = await db.transaction(async (trx) => {
    const sheet = await getSheet({ vendorId, slug, trx, lock: true });
    const query = trx("sheet_versions").where({ vendor_id: vendorId, sheet_id: sheet.id });
    const target = await (number ? query.where({ number }) : query.where({ state: "published" })).first<
      { id: string; number: number; state: string } | undefined
    >("id", "number", "state");
    if (!target) throw new NotFound(number ? `No version ${number}.` : "This sheet has no published version.");
    if (target.state !== "published" && target.state !== "superseded")
      throw new Conflict(
        `Version ${target.number} is ${target.state.replace("_", " ")}; only published or superseded versions are withdrawn.`,
      );
    await trx("sheet_versions")
      .where({ vendor_id: vendorId, id: target.id })
      .update({ state: "withdrawn", withdrawn_at: trx.fn.now(), withdrawn_reason: text, updated_at: trx.fn.now() });
    await writeAudit(
      {
        vendorId,
        actorUserId: userId,
        action: "sheet.withdraw",
        objectType: "sheet_version",
        objectId: target.id,
        details: { slug, number: target.number, reason: text },
      },
      trx,
    );
    await emitSheetEvent(trx, { type: "version.withdrawn", vendorId, sheetId: sheet.id, versionId: target.id });
    return { number: target.number, state: "withdrawn" as const, sheetId: sheet.id, versionId: target.id };
  });
  return result;
}
