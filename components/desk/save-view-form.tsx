"use client";

import { useState, useTransition } from "react";

import type { FormAction } from "@/lib/actions/action-state";
import type { QueueFilters } from "@/lib/desk/queue-filters";

/** Saves the current filters as one of this agent's views. */
export function SaveViewForm({
  vendor,
  filters,
  onSaved,
  saveViewAction,
}: {
  vendor: string;
  filters: QueueFilters;
  onSaved: () => void;
  saveViewAction: FormAction;
}) {
  const [name, setName] = useState("");
  const [message, setMessage] = useState<string | null>(null);
  const [pending, startTransition] = useTransition();
  function save() {
    const form = new FormData();
    form.set("vendor", vendor);
    form.set("name", name);
    form.set("filters", JSON.stringify(filters));
    startTransition(async () => {
      const result = await saveViewAction({ ok: false }, form);
      setMessage(result.ok ? (result.message ?? "Saved.") : (result.errors?.name?.join(" ") ?? result.message ?? "Not saved."));
      if (result.ok) {
        setName("");
        onSaved();
      }
    });
  }
  return (
    <div className="flex flex-wrap items-center gap-2 text-sm">
      <label htmlFor="view-name">Save these filters as a view</label>
      <input
        id="view-name"
        value={name}
        onChange={(e) => setName(e.target.value)}
        maxLength={60}
        className="min-h-9 rounded border border-stone-300 bg-white px-2"
        placeholder="e.g. Urgent plastics"
      />
      <button
        type="button"
        onClick={save}
        disabled={!name.trim() || pending}
        className="min-h-9 rounded border border-stone-300 bg-white px-3 disabled:opacity-50"
      >
        Save view
      </button>
      {message ? <span role="status">{message}</span> : null}
    </div>
  );
}
