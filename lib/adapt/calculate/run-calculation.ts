import { calculateBodySchema } from "@/content-schema/calculate";
import { adaptRecipe, isMachiningInputError } from "@/lib/machining";

import { bodyPathOf } from "./field-paths";
import { presentResult, type CalculationResult } from "./present-result";
import { toEngineInput } from "./to-engine-input";

export type CalculationOutcome =
  { ok: true; result: CalculationResult } | { ok: false; status: 400; errors: Record<string, string[]>; message: string };

const INVALID = "The calculation input is invalid; see errors for each field.";

/** Validates a calculate body, adapts the recipe and returns it in both unit systems. No HTTP here. */
export function runCalculation(body: unknown): CalculationOutcome {
  const parsed = calculateBodySchema.safeParse(body);
  if (!parsed.success) {
    const errors: Record<string, string[]> = {};
    for (const issue of parsed.error.issues) {
      const path = issue.path.map(String).join(".") || "body";
      (errors[path] ??= []).push(issue.message);
    }
    return { ok: false, status: 400, errors, message: INVALID };
  }
  try {
    const result = adaptRecipe(toEngineInput(parsed.data));
    return { ok: true, result: presentResult(result, parsed.data.units) };
  } catch (error) {
    if (!isMachiningInputError(error)) throw error;
    const path = bodyPathOf(error.field);
    const message = error.message.startsWith(error.field) ? path + error.message.slice(error.field.length) : error.message;
    return { ok: false, status: 400, errors: { [path]: [message] }, message: INVALID };
  }
}
