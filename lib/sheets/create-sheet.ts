import "server-only";

import { writeAudit } from "@/lib/audit/write-audit";
import { isUniqueViolation } from "@/lib/catalogue/unique-violation";
import { db } from "@/lib/db/knex";
import { InvalidInput } from "@/lib/errors/domain-errors";

import { checkDraftSource, type Refs } from "./check-draft-source";

type Options = { vendorId: string; userId: string; slug: string; source: string; refs?: Refs };

/**
 * A new sheet with its first version as a draft. Without `refs`, the cutter, material and machine
 * class come from the source's front matter (the API path), so that source must name valid entries.
 */
export async function createSheet({ vendorId, userId, slug, source, refs }: Options) {
  const check = await checkDraftSource({ vendorId, source, expected: refs });
  const sheetRefs = refs ?? check.refs;
  if (!sheetRefs) {
    const message = "The front matter must name a cutter, material and machine class from the catalogue.";
    throw new InvalidInput(message, { source: check.issues.length ? check.issues.map((i) => `line ${i.line}: ${i.message}`) : [message] });
  }
  try {
    return await db.transaction(async (trx) => {
      const [sheet] = await trx("sheets")
        .insert({
          vendor_id: vendorId,
          slug,
          cutter_id: sheetRefs.cutterId,
          material_id: sheetRefs.materialId,
          machine_class_id: sheetRefs.machineClassId,
          created_by: userId,
        })
        .returning("id");
      const [version] = await trx("sheet_versions")
        .insert({
          vendor_id: vendorId,
          sheet_id: sheet.id,
          number: 1,
          state: "draft",
          title: check.frontMatter?.title ?? slug,
          source,
          front_matter: JSON.stringify(check.ok ? check.frontMatter : {}),
          author_id: userId,
          updated_by: userId,
        })
        .returning(["id", "number", "revision"]);
      await writeAudit(
        { vendorId, actorUserId: userId, action: "sheet.create", objectType: "sheet", objectId: sheet.id, details: { slug } },
        trx,
      );
      return {
        sheetId: sheet.id as string,
        slug,
        versionId: version.id as string,
        number: version.number as number,
        revision: version.revision as number,
        issues: check.issues,
      };
    });
  } catch (error) {
    if (isUniqueViolation(error))
      throw new InvalidInput(`A sheet with slug ${slug} already exists.`, { slug: [`A sheet with slug ${slug} already exists.`] });
    throw error;
  }
}
