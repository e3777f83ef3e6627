"use client";

import { useActionState, useState, type ReactNode } from "react";

import { FormMessage } from "@/components/forms/form-message";
import { SubmitButton } from "@/components/forms/submit-button";
import { initialActionState, type ActionState } from "@/lib/actions/action-state";

type Props = {
  action: (state: ActionState, form: FormData) => Promise<ActionState>;
  hidden: Record<string, string>;
  submitLabel: string;
  variant?: "primary" | "quiet" | "danger";
  /** The fields; after a refusal they get what was sent, since React empties a form once its action returns. */
  children?: (errors: Record<string, string[]>, sent: ActionState) => ReactNode;
  label?: string;
  /** Asks before acting (publishing reaches every customer): the button first shows this question with a confirm and a cancel. */
  confirm?: { question: string; yes: string };
};

/** A small form for one workflow step; refusals (e.g. approving your own draft) show beside the button. */
export function ActionForm({ action, hidden, submitLabel, variant = "primary", children, label, confirm }: Props) {
  const [state, formAction] = useActionState(action, initialActionState);
  const [asking, setAsking] = useState(false);
  return (
    <form action={formAction} aria-label={label ?? submitLabel} className="flex flex-col gap-2">
      {Object.entries(hidden).map(([name, value]) => (
        <input key={name} type="hidden" name={name} value={value} />
      ))}
      {children?.(state.errors ?? {}, state)}
      {confirm && asking ? (
        <div
          role="group"
          aria-label="Confirm"
          className="flex flex-wrap items-center gap-3 rounded border border-amber-300 bg-amber-50 p-3"
        >
          <p className="text-sm">{confirm.question}</p>
          <SubmitButton variant={variant} pendingText="Working…">
            {confirm.yes}
          </SubmitButton>
          <button
            type="button"
            onClick={() => setAsking(false)}
            className="min-h-11 rounded border border-stone-300 bg-white px-4 py-2 font-medium"
          >
            Cancel
          </button>
        </div>
      ) : (
        <div className="flex flex-wrap items-center gap-3">
          {confirm ? (
            <button
              type="button"
              onClick={() => setAsking(true)}
              className="min-h-11 rounded bg-accent px-4 py-2 font-medium text-accent-ink"
            >
              {submitLabel}
            </button>
          ) : (
            <SubmitButton variant={variant} pendingText="Working…">
              {submitLabel}
            </SubmitButton>
          )}
        </div>
      )}
      <FormMessage state={state} />
    </form>
  );
}
