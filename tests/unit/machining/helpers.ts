import { expect } from "vitest";

import { adaptRecipe, MachiningInputError, type AdaptInput, type AdaptResult, type RuleId } from "@/lib/machining";

export const codes = (r: AdaptResult) => r.warnings.map((w) => w.code);
export const stepsOf = (r: AdaptResult, rule: RuleId) => r.steps.filter((s) => s.rule === rule);
export const valueOf = (r: AdaptResult, code: string, name: string) =>
  r.warnings.find((w) => w.code === code)?.values?.find((v) => v.name === name)?.value;

/** The field a refused input names, or "no error" when the engine accepts it. */
export const fieldOf = (input: AdaptInput) => {
  try {
    adaptRecipe(input);
  } catch (error) {
    expect(error).toBeInstanceOf(MachiningInputError);
    return (error as MachiningInputError).field;
  }
  return "no error";
};
