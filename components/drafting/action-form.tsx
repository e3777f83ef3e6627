"use client";

import { type ReactNode, useActionState } from "react";

import { FormMessage } from "@/components/forms/form-message";
import { SubmitButton } from "@/components/forms/submit-button";
import { type ActionState, initialActionState } from "@/lib/actions/action-state";

type Props = {
  action: (state: ActionState, form: FormData) => Promise<ActionState>;
  hidden: Record<string, string>;
  submitLabel: string;
  variant?: "primary" | "quiet" | "danger";
  children?: (errors: Record<string, string[]>) => ReactNode;
  label?: string;
};

/** A small form for one workflow step; refusals (e.g. approving your own draft) show beside the button. */
export function ActionForm({ action, hidden, submitLabel, variant = "primary", children, label }: Props) {
  const [state, formAction] = useActionState(action, initialActionState);
  return (
    <form action={formAction} aria-label={label ?? submitLabel} className="flex flex-col gap-2">
      {Object.entries(hidden).map(([name, value]) => <input key={name} type="hidden" name={name} value={value} />)}
      {children?.(state.errors ?? {})}
      <div className="flex flex-wrap items-center gap-3">
        <SubmitButton variant={variant} pendingText="Working…">{submitLabel}</SubmitButton>
        <FormMessage state={state} />
      </div>
    </form>
  );
}
