import "server-only";

import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { Conflict } from "@/lib/errors/domain-errors";

import { checkDraftSource } from "./check-draft-source";
import { findOpenDraft, getSheet } from "./find-sheet";

/** A new draft copied from the latest version (or from `source`, the API's PUT without an open draft). */
export async function startNewVersion({ vendorId, userId, slug, source }: { vendorId: string; userId: string; slug: string; source?: string }) {
  return db.transaction(async (trx) => {
    const sheet = await getSheet({ vendorId, slug, trx, lock: true });
    if (await findOpenDraft({ vendorId, sheetId: sheet.id, trx })) throw new Conflict("This sheet already has an open draft.");
    const latest = await trx("sheet_versions").where({ vendor_id: vendorId, sheet_id: sheet.id }).orderBy("number", "desc").first<{ number: number; source: string; title: string } | undefined>("number", "source", "title");
    const text = source ?? latest?.source ?? "";
    const check = await checkDraftSource({ vendorId, source: text, expected: sheet, trx });
    const number = (latest?.number ?? 0) + 1;
    const [row] = await trx("sheet_versions")
      .insert({ vendor_id: vendorId, sheet_id: sheet.id, number, state: "draft", title: check.frontMatter?.title ?? latest?.title ?? slug, source: text, front_matter: JSON.stringify(check.ok ? check.frontMatter : {}), author_id: userId, updated_by: userId })
      .returning(["id", "revision"]);
    await writeAudit({ vendorId, actorUserId: userId, action: "sheet.new_version", objectType: "sheet_version", objectId: row.id, details: { slug, number, from: latest?.number ?? null } }, trx);
    return { number, revision: row.revision as number, versionId: row.id as string, issues: check.issues };
  });
}
