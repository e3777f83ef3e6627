import "server-only";

import { db } from "@/lib/db/knex";
import { Conflict, NotFound } from "@/lib/errors/domain-errors";

import { checkDraftSource } from "./check-draft-source";
import { findOpenDraft, getSheet } from "./find-sheet";

/** The newer text that a stale save ran into; the caller keeps both. */
export class DraftConflict extends Conflict {
  constructor(readonly current: { source: string; revision: number; updatedByName: string | null; updatedAt: Date }) {
    super(
      `Someone else saved this draft (revision ${current.revision}${current.updatedByName ? `, by ${current.updatedByName}` : ""}) after you opened it. Nothing was overwritten.`,
    );
  }
}

type Options = { vendorId: string; userId: string; slug: string; source: string; revision: number };

/** Saves a draft's source if nobody saved since `revision` (optimistic concurrency); invalid drafts are kept too. */
export async function saveDraft({ vendorId, userId, slug, source, revision }: Options) {
  const sheet = await getSheet({ vendorId, slug });
  const draft = await findOpenDraft({ vendorId, sheetId: sheet.id });
  if (!draft) throw new NotFound("This sheet has no open draft.");
  if (draft.state !== "draft") throw new Conflict("This version is in review. Return it to draft to edit it.");
  const check = await checkDraftSource({ vendorId, source, expected: sheet });
  const [row] = await db("sheet_versions")
    .where({ vendor_id: vendorId, id: draft.id, state: "draft", revision })
    .update({
      source,
      title: check.frontMatter?.title ?? draft.title,
      front_matter: JSON.stringify(check.ok ? check.frontMatter : {}),
      revision: db.raw("revision + 1"),
      updated_by: userId,
      updated_at: db.fn.now(),
    })
    .returning(["revision", "updated_at"]);
  if (!row) {
    const fresh = await findOpenDraft({ vendorId, sheetId: sheet.id });
    if (!fresh || fresh.state !== "draft") throw new Conflict("This version is no longer a draft. Reload to see it.");
    throw new DraftConflict({
      source: fresh.source,
      revision: fresh.revision,
      updatedByName: fresh.updatedByName,
      updatedAt: fresh.updatedAt,
    });
  }
  return { revision: row.revision as number, savedAt: row.updated_at as Date, issues: check.issues, valid: check.ok };
}
