import type { AdaptResult, RuleId } from "@/lib/machining";

export const codes = (r: AdaptResult) => r.warnings.map((w) => w.code);
export const stepsOf = (r: AdaptResult, rule: RuleId) => r.steps.filter((s) => s.rule === rule);
export const valueOf = (r: AdaptResult, code: string, name: string) =>
  r.warnings.find((w) => w.code === code)?.values?.find((v) => v.name === name)?.value;
