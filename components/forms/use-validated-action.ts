"use client";

import { useActionState, useState, type FormEvent } from "react";
import type { z } from "zod";

import { initialActionState, type FormAction } from "@/lib/actions/action-state";
import type { FieldErrors } from "@/lib/errors/domain-errors";

/** Server action state plus the same zod schema checked in the browser before submitting. */
export function useValidatedAction(action: FormAction, schema: z.ZodType) {
  const [state, formAction, pending] = useActionState(action, initialActionState);
  const [clientErrors, setClientErrors] = useState<FieldErrors | null>(null);
  function onSubmit(event: FormEvent<HTMLFormElement>) {
    const values = Object.fromEntries(new FormData(event.currentTarget).entries());
    const result = schema.safeParse(values);
    if (result.success) {
      setClientErrors(null);
      return;
    }
    event.preventDefault();
    const errors: FieldErrors = {};
    for (const issue of result.error.issues) (errors[issue.path.join(".") || "_form"] ??= []).push(issue.message);
    setClientErrors(errors);
  }
  const errors = clientErrors ?? state.errors ?? {};
  return { state, formAction, pending, onSubmit, errors };
}
