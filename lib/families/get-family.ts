import "server-only";

import type { Knex } from "knex";

import { db } from "@/lib/db/knex";
import type { FamilyRow } from "@/lib/db/tables";
import { NotFound } from "@/lib/errors/domain-errors";

import { rowToFamily, rowToRuleSet, type Family, type RuleSet } from "./family-rows";

export async function listFamilies({ vendorId }: { vendorId: string }) {
  const rows = await db("families as f")
    .where({ "f.vendor_id": vendorId })
    .select<(FamilyRow & { rule_version: number | null; batches: number })[]>(
      "f.*",
      db.raw("(select max(number) from family_rule_sets r where r.family_id = f.id and r.vendor_id = f.vendor_id) as rule_version"),
      db.raw("(select count(*)::int from family_batches b where b.family_id = f.id and b.vendor_id = f.vendor_id) as batches"),
    )
    .orderBy("f.name");
  return rows.map((r) => ({ ...rowToFamily(r), ruleVersion: r.rule_version ?? 0, batches: r.batches }));
}

export async function getFamily({ vendorId, slug, trx = db }: { vendorId: string; slug: string; trx?: Knex }): Promise<Family> {
  const row = await trx("families").where({ vendor_id: vendorId, slug }).first();
  if (!row) throw new NotFound("No such family.");
  return rowToFamily(row);
}

/** The family's newest rules version (every family has one from its creation). */
export async function getLatestRuleSet({
  vendorId,
  familyId,
  trx = db,
}: {
  vendorId: string;
  familyId: string;
  trx?: Knex;
}): Promise<RuleSet> {
  const row = await trx("family_rule_sets").where({ vendor_id: vendorId, family_id: familyId }).orderBy("number", "desc").first();
  if (!row) throw new NotFound("This family has no rules.");
  return rowToRuleSet(row);
}

export async function getRuleSet({ vendorId, id, trx = db }: { vendorId: string; id: string; trx?: Knex }): Promise<RuleSet> {
  const row = await trx("family_rule_sets").where({ vendor_id: vendorId, id }).first();
  if (!row) throw new NotFound("No such rules version.");
  return rowToRuleSet(row);
}
