import "server-only";

import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { Conflict, InvalidInput } from "@/lib/errors/domain-errors";
import { formatIssue } from "@/lib/mdx/sheet-issue";

import { checkDraftSource } from "./check-draft-source";
import { lockOpenDraft } from "./find-sheet";

/** draft → in_review: the source must validate and the change note say what changed. */
export async function submitDraft({
  vendorId,
  userId,
  slug,
  changeNote,
}: {
  vendorId: string;
  userId: string;
  slug: string;
  changeNote: string;
}) {
  const note = changeNote.trim();
  if (note.length < 3) throw new InvalidInput("A change note is required to submit.", { changeNote: ["Say what changed and why."] });
  return db.transaction(async (trx) => {
    const { sheet, draft } = await lockOpenDraft({ vendorId, slug, trx });
    if (draft.state !== "draft") throw new Conflict("This version is already in review.");
    const check = await checkDraftSource({ vendorId, source: draft.source, expected: sheet, trx });
    if (!check.ok) {
      const errors = check.issues.filter((i) => i.severity === "error").map(formatIssue);
      throw new InvalidInput(`The draft has ${errors.length} error(s); fix them before submitting.`, { source: errors });
    }
    await trx("sheet_versions")
      .where({ vendor_id: vendorId, id: draft.id })
      .update({
        state: "in_review",
        change_note: note,
        submitted_at: trx.fn.now(),
        front_matter: JSON.stringify(check.frontMatter),
        approved_by: null,
        approved_at: null,
        updated_at: trx.fn.now(),
      });
    await writeAudit(
      {
        vendorId,
        actorUserId: userId,
        action: "sheet.submit",
        objectType: "sheet_version",
        objectId: draft.id,
        details: { slug, number: draft.number, changeNote: note },
      },
      trx,
    );
    return { number: draft.number, state: "in_review" as const };
  });
}
