import type { FamilyRule, FamilyRules } from "@/content-schema/family";
import type { OperationKind } from "@/content-schema/sheet-kinds";

// Pure: which rules of a family apply to one operation of one cell, and what they set together.

const FIELDS = ["vcPosition", "chipLoadPosition", "apPerD", "aePerD", "entry", "rampAngleDeg"] as const;
export type ResolvedRule = Partial<Pick<FamilyRule, (typeof FIELDS)[number]>>;

/** A rule's name as generated numbers record it: group/kind, and @class when it is for one machine class. */
export const ruleKey = (rule: Pick<FamilyRule, "materialGroup" | "kind" | "machineClass">) =>
  `${rule.materialGroup}/${rule.kind}${rule.machineClass ? `@${rule.machineClass}` : ""}`;

/** The group-wide rule first, then the machine class's own rule over it; each field from the most specific rule that sets it. */
export function resolveRule(
  rules: FamilyRules,
  cell: { materialGroup: string; machineClassSlug: string; kind: OperationKind },
): { rule: ResolvedRule; keys: string[] } {
  const matching = rules.rules
    .filter(
      (r) =>
        r.materialGroup === cell.materialGroup && r.kind === cell.kind && (!r.machineClass || r.machineClass === cell.machineClassSlug),
    )
    .sort((a, b) => Number(Boolean(a.machineClass)) - Number(Boolean(b.machineClass)));
  const rule: ResolvedRule = {};
  for (const r of matching) {
    for (const field of FIELDS) if (r[field] !== undefined) Object.assign(rule, { [field]: r[field] });
  }
  return { rule, keys: matching.map(ruleKey) };
}
