import "server-only";

import { isDeepStrictEqual } from "node:util";

import type { FamilyDefinition, FamilyRules } from "@/content-schema/family";
import { writeAudit } from "@/lib/audit/write-audit";
import { isUniqueViolation } from "@/lib/catalogue/unique-violation";
import { db } from "@/lib/db/knex";
import { InvalidInput } from "@/lib/errors/domain-errors";

import { getFamily, getLatestRuleSet } from "./get-family";

/** The catalogue entries a definition names must be this vendor's. */
async function checkRefs(vendorId: string, definition: FamilyDefinition) {
  const materials = await db("materials")
    .where({ vendor_id: vendorId })
    .whereIn("id", definition.materialIds)
    .count<{ count: string }[]>("id as count");
  const classes = await db("machine_classes")
    .where({ vendor_id: vendorId })
    .whereIn("id", definition.machineClassIds)
    .count<{ count: string }[]>("id as count");
  if (Number(materials[0].count) !== new Set(definition.materialIds).size)
    throw new InvalidInput("Pick materials from the catalogue.", { materialIds: ["Pick materials from the catalogue."] });
  if (Number(classes[0].count) !== new Set(definition.machineClassIds).size)
    throw new InvalidInput("Pick machine classes from the catalogue.", { machineClassIds: ["Pick machine classes from the catalogue."] });
}

/** A new family with its first rules version. */
export async function createFamily({
  vendorId,
  userId,
  definition,
  rules,
}: {
  vendorId: string;
  userId: string;
  definition: FamilyDefinition;
  rules: FamilyRules;
}) {
  await checkRefs(vendorId, definition);
  try {
    return await db.transaction(async (trx) => {
      const [family] = await trx("families")
        .insert({
          vendor_id: vendorId,
          slug: definition.slug,
          name: definition.name,
          cutter_selection: JSON.stringify(definition.cutters),
          material_ids: [...new Set(definition.materialIds)],
          machine_class_ids: [...new Set(definition.machineClassIds)],
          created_by: userId,
        })
        .returning(["id", "slug"]);
      await trx("family_rule_sets").insert({
        vendor_id: vendorId,
        family_id: family.id,
        number: 1,
        rules: JSON.stringify(rules),
        note: "First rules.",
        created_by: userId,
      });
      await writeAudit(
        {
          vendorId,
          actorUserId: userId,
          action: "family.create",
          objectType: "family",
          objectId: family.id,
          details: { slug: family.slug },
        },
        trx,
      );
      return { id: family.id, slug: family.slug };
    });
  } catch (error) {
    if (isUniqueViolation(error))
      throw new InvalidInput(`A family with slug ${definition.slug} already exists.`, { slug: ["This slug is taken."] });
    throw error;
  }
}

/** Rules as a new version; the same rules again make no new version (generation would find nothing new either). */
export async function saveFamilyRules({
  vendorId,
  userId,
  slug,
  rules,
  note,
}: {
  vendorId: string;
  userId: string;
  slug: string;
  rules: FamilyRules;
  note: string;
}) {
  return db.transaction(async (trx) => {
    const family = await getFamily({ vendorId, slug, trx });
    await trx("families").where({ vendor_id: vendorId, id: family.id }).forUpdate().first("id");
    const latest = await getLatestRuleSet({ vendorId, familyId: family.id, trx });
    if (isDeepStrictEqual(latest.rules, rules)) return { number: latest.number, created: false };
    const number = latest.number + 1;
    await trx("family_rule_sets").insert({
      vendor_id: vendorId,
      family_id: family.id,
      number,
      rules: JSON.stringify(rules),
      note,
      created_by: userId,
    });
    await trx("families").where({ vendor_id: vendorId, id: family.id }).update({ updated_at: trx.fn.now() });
    await writeAudit(
      { vendorId, actorUserId: userId, action: "family.rules", objectType: "family", objectId: family.id, details: { slug, number, note } },
      trx,
    );
    return { number, created: true };
  });
}
