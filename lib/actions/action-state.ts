import type { FieldErrors } from "@/lib/errors/domain-errors";

export type ActionState<T = unknown> = {
  ok: boolean;
  message?: string;
  errors?: FieldErrors;
  data?: T;
  /** The submitted values, so a form can show them again after an error. */
  values?: Record<string, string>;
  /** The submitted fields sent more than once (a checkbox group with several boxes ticked). */
  lists?: Record<string, string[]>;
};

export const initialActionState: ActionState = { ok: false };

/** A server action a form posts to (`useActionState`); pages pass it to components as a prop. */
export type FormAction = (state: ActionState, form: FormData) => Promise<ActionState>;

/**
 * What a refused form sent under `name` as a list (a checkbox group): undefined before anything was sent back,
 * an empty list when nothing under that name was ticked.
 */
export function sentList(state: ActionState, name: string): string[] | undefined {
  if (!state.values) return undefined;
  const single = state.values[name];
  return state.lists?.[name] ?? (single === undefined ? [] : [single]);
}
