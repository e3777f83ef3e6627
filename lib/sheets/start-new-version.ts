import "server-only";

import type { Knex } from "knex";

import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { Conflict } from "@/lib/errors/domain-errors";

import { checkDraftSource } from "./check-draft-source";
import { findOpenDraft, getSheet } from "./find-sheet";

type Options = {
  vendorId: string;
  userId: string;
  slug: string;
  /** The text of the new draft; the latest version's when left out (the API's PUT without an open draft gives it). */
  source?: string;
  /** A change note to start from (the engineer edits it before sending the draft to review). */
  changeNote?: string;
  /** Extra facts for the audit entry: where the draft came from. */
  origin?: Record<string, unknown>;
};

/** A new draft copied from the latest version (or from `source`). */
export async function startNewVersion(options: Options) {
  return db.transaction((trx) => startNewVersionIn(trx, options));
}

/** startNewVersion inside the caller's transaction, so what the caller writes beside it commits with it. */
export async function startNewVersionIn(trx: Knex.Transaction, { vendorId, userId, slug, source, changeNote = "", origin }: Options) {
  const sheet = await getSheet({ vendorId, slug, trx, lock: true });
  if (await findOpenDraft({ vendorId, sheetId: sheet.id, trx })) throw new Conflict("This sheet already has an open draft.");
  const latest = await trx("sheet_versions")
    .where({ vendor_id: vendorId, sheet_id: sheet.id })
    .orderBy("number", "desc")
    .first<{ number: number; source: string; title: string } | undefined>("number", "source", "title");
  const text = source ?? latest?.source ?? "";
  const check = await checkDraftSource({ vendorId, source: text, expected: sheet, trx });
  const number = (latest?.number ?? 0) + 1;
  const [row] = await trx("sheet_versions")
    .insert({
      vendor_id: vendorId,
      sheet_id: sheet.id,
      number,
      state: "draft",
      title: check.frontMatter?.title ?? latest?.title ?? slug,
      source: text,
      front_matter: JSON.stringify(check.ok ? check.frontMatter : {}),
      change_note: changeNote,
      author_id: userId,
      updated_by: userId,
    })
    .returning(["id", "revision"]);
  await writeAudit(
    {
      vendorId,
      actorUserId: userId,
      action: "sheet.new_version",
      objectType: "sheet_version",
      objectId: row.id,
      details: { slug, number, from: latest?.number ?? null, ...origin },
    },
    trx,
  );
  return { number, revision: row.revision as number, versionId: row.id as string, issues: check.issues };
}
