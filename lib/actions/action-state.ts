import type { FieldErrors } from "@/lib/errors/domain-errors";

export type ActionState<T = unknown> = {
  ok: boolean;
  message?: string;
  errors?: FieldErrors;
  data?: T;
  /** The submitted values, so a form can show them again after an error. */
  values?: Record<string, string>;
};

export const initialActionState: ActionState = { ok: false };

/** A server action a form posts to (`useActionState`); pages pass it to components as a prop. */
export type FormAction = (state: ActionState, form: FormData) => Promise<ActionState>;
