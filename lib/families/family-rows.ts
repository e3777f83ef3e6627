import { cutterSelectionSchema, familyRulesSchema, type CutterSelection, type FamilyRules } from "@/content-schema/family";

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

type Row = Record<string, unknown>;

export const rowToFamily = (r: Row): Family => ({
  id: String(r.id),
  slug: String(r.slug),
  name: String(r.name),
  cutters: cutterSelectionSchema.parse(r.cutter_selection),
  materialIds: (r.material_ids as string[]) ?? [],
  machineClassIds: (r.machine_class_ids as string[]) ?? [],
  updatedAt: r.updated_at as Date,
});

export const rowToRuleSet = (r: Row): RuleSet => ({
  id: String(r.id),
  familyId: String(r.family_id),
  number: Number(r.number),
  rules: familyRulesSchema.parse(r.rules),
  note: String(r.note ?? ""),
  createdAt: r.created_at as Date,
});
