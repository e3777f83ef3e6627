"use client";

import { useActionState } from "react";

import { FormMessage } from "@/components/forms/form-message";
import { SubmitButton } from "@/components/forms/submit-button";
import { initialActionState, type FormAction } from "@/lib/actions/action-state";
import { SNIPPET_PLACEHOLDERS } from "@/lib/desk/expand-snippet";

/** Adds or replaces (by title) a saved reply snippet for the whole support team. */
export function SnippetForm({ vendor, saveSnippetAction }: { vendor: string; saveSnippetAction: FormAction }) {
  const [state, action] = useActionState(saveSnippetAction, initialActionState);
  return (
    <form action={action} className="max-w-2xl space-y-2 text-sm" aria-label="Save a snippet">
      <input type="hidden" name="vendor" value={vendor} />
      <label className="block">
        Title
        <input name="title" required maxLength={80} className="min-h-9 w-full rounded border border-stone-300 bg-white px-2" />
      </label>
      <label className="block">
        Text (Markdown)
        <textarea name="body" required rows={4} className="w-full rounded border border-stone-300 bg-white px-2 font-mono" />
      </label>
      <p className="text-xs text-stone-600">Placeholders: {SNIPPET_PLACEHOLDERS.map((p) => `{{${p}}}`).join(", ")}</p>
      <FormMessage state={state} success={state.message} />
      <SubmitButton variant="quiet">Save snippet</SubmitButton>
    </form>
  );
}
