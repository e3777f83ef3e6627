import { cutterSelectionSchema, familyRulesSchema, type CutterSelection, type FamilyRules } from "@/content-schema/family";
import type { FamilyRow, FamilyRuleSetRow } from "@/lib/db/tables";

// Rows of the family tables as the app reads them; JSON columns parsed again with their schemas.

export type Family = {
  id: string;
  slug: string;
  name: string;
  cutters: CutterSelection;
  materialIds: string[];
  machineClassIds: string[];
  updatedAt: Date;
};
export type RuleSet = { id: string; familyId: string; number: number; rules: FamilyRules; note: string; createdAt: Date };

export const rowToFamily = (r: FamilyRow): Family => ({
  id: r.id,
  slug: r.slug,
  name: r.name,
  cutters: cutterSelectionSchema.parse(r.cutter_selection),
  materialIds: r.material_ids,
  machineClassIds: r.machine_class_ids,
  updatedAt: r.updated_at,
});

export const rowToRuleSet = (r: FamilyRuleSetRow): RuleSet => ({
  id: r.id,
  familyId: r.family_id,
  number: r.number,
  rules: familyRulesSchema.parse(r.rules),
  note: r.note,
  createdAt: r.created_at,
});
