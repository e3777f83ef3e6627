import type { z } from "zod";

import { InvalidInput, type FieldErrors } from "./domain-errors";

export function fieldErrorsOf(error: z.ZodError): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join(".") : "_form";
    (out[key] ??= []).push(issue.message);
  }
  return out;
}

/** Parse where input enters; a failure becomes an InvalidInput with field-level messages. */
export function parseInput<S extends z.ZodType>(schema: S, input: unknown, message = "Please correct the marked fields."): z.output<S> {
  const result = schema.safeParse(input);
  if (!result.success) throw new InvalidInput(message, fieldErrorsOf(result.error));
  return result.data;
}
