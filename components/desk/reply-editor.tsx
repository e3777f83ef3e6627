"use client";

import { useEffect, useRef, useState } from "react";

import { FormMessage } from "@/components/forms/form-message";
import { IdempotencyKeyField } from "@/components/forms/idempotency-key-field";
import { SubmitButton } from "@/components/forms/submit-button";
import { useKeptText } from "@/components/forms/use-kept-text";
import { useValidatedAction } from "@/components/forms/use-validated-action";
import { SafeMarkdown } from "@/components/support/safe-markdown";
import { UploadField } from "@/components/support/upload-field";
import { ticketReplySchema } from "@/content-schema/ticket-update";
import type { FormAction } from "@/lib/actions/action-state";
import { expandSnippet, type SnippetValues } from "@/lib/desk/expand-snippet";
import type { PickerPage, PickerVersion } from "@/lib/desk/picker-versions";

import { useVersionPicker } from "./use-version-picker";

type Option = { id: string; name: string };
type Version = Omit<PickerVersion, "machineClass">;
type Props = {
  staffReplyAction: FormAction;
  vendor: string;
  ticketId: string;
  /** The first current versions, shown until the agent types words to find others. */
  firstVersions: PickerPage;
  /** The ticket's linked sheet versions, listed first in the picker. */
  linkedVersions?: Version[];
  machines: Option[];
  defaultMachineId: string | null;
  defaultVersionId: string | null;
  snippets: { id: string; title: string; body: string }[];
  placeholders: SnippetValues;
};

const BODY_ID = "f-staff-body";
const field = "min-h-9 rounded border border-stone-300 bg-white px-2 text-sm";

/** Markdown reply or internal note, with an adapted-sheet picker and saved snippets. */
export function ReplyEditor({
  staffReplyAction,
  vendor,
  ticketId,
  firstVersions,
  linkedVersions = [],
  machines,
  defaultMachineId,
  defaultVersionId,
  snippets,
  placeholders,
}: Props) {
  const { state, formAction, onSubmit, errors } = useValidatedAction(staffReplyAction, ticketReplySchema);
  const [visibility, setVisibility] = useState<"public" | "note">("public");
  const note = visibility === "note";
  const picker = useVersionPicker(vendor, firstVersions);
  const [chosen, setChosen] = useState<Version | null>(null);
  const isLinked = (v: Version) => linkedVersions.some((l) => l.id === v.id);
  const found = picker.page.versions.filter((v) => !isLinked(v));
  const groups = [
    { label: "Linked to this ticket", items: linkedVersions },
    ...(picker.asked
      ? [{ label: `Found for “${picker.asked}”`, items: found }]
      : [
          { label: "Current versions", items: found.filter((v) => v.state === "published") },
          { label: "Older versions", items: found.filter((v) => v.state !== "published") },
        ]),
  ];
  // The chosen version stays selectable while other words are typed.
  if (chosen && !groups.some((g) => g.items.some((v) => v.id === chosen.id))) groups.push({ label: "Chosen", items: [chosen] });
  const shownGroups = groups.filter((g) => g.items.length);
  const [body, setBody] = useKeptText(BODY_ID, "");
  const [preview, setPreview] = useState(false);
  const [versionId, setVersionId] = useState("");
  const form = useRef<HTMLFormElement>(null);
  // After a successful send: clear the editor (derived from the new action state, not in an effect).
  const [seen, setSeen] = useState(state);
  const [sent, setSent] = useState(0);
  if (state !== seen) {
    setSeen(state);
    if (state.ok) {
      setBody("");
      setVersionId("");
      setChosen(null);
      setVisibility("public");
      setSent((n) => n + 1);
    }
  }
  useEffect(() => {
    if (sent) form.current?.reset();
  }, [sent]);
  const sheetTitle = [...linkedVersions, ...(chosen ? [chosen] : [])].find((v) => v.id === (versionId || defaultVersionId))?.name;
  const values = { ...placeholders, "sheet.title": sheetTitle ?? placeholders["sheet.title"] };

  return (
    <form
      ref={form}
      action={formAction}
      onSubmit={onSubmit}
      data-mode={visibility}
      className={`space-y-3 rounded-lg border p-4 ${note ? "border-amber-400 bg-amber-50" : "border-stone-300 bg-white"}`}
      aria-label={note ? "Internal note editor" : "Reply editor"}
    >
      <input type="hidden" name="vendor" value={vendor} />
      <input type="hidden" name="ticketId" value={ticketId} />
      <IdempotencyKeyField renewOn={state.ok ? state : null} />
      <fieldset className="flex flex-wrap gap-4 text-sm">
        <legend className="sr-only">Kind of message</legend>
        <label className="flex items-center gap-2">
          <input type="radio" name="visibility" value="public" checked={!note} onChange={() => setVisibility("public")} /> Reply to customer
        </label>
        <label className="flex items-center gap-2">
          <input type="radio" name="visibility" value="note" checked={note} onChange={() => setVisibility("note")} /> Internal note (staff
          only)
        </label>
      </fieldset>
      {note ? (
        <p className="text-sm font-medium text-amber-900" id="note-mode-hint">
          Internal note: only staff see this; the customer is not told.
        </p>
      ) : null}
      <div className="flex flex-wrap items-center gap-2 text-sm">
        <button type="button" onClick={() => setPreview(false)} aria-pressed={!preview} className="rounded px-2 aria-pressed:bg-stone-200">
          Write
        </button>
        <button type="button" onClick={() => setPreview(true)} aria-pressed={preview} className="rounded px-2 aria-pressed:bg-stone-200">
          Preview
        </button>
        {snippets.length ? (
          <select
            aria-label="Insert snippet"
            className={field}
            value=""
            onChange={(e) => {
              const s = snippets.find((x) => x.id === e.target.value);
              if (s) setBody((b) => (b ? `${b}\n\n` : "") + expandSnippet(s.body, values));
            }}
          >
            <option value="">Insert a snippet…</option>
            {snippets.map((s) => (
              <option key={s.id} value={s.id}>
                {s.title}
              </option>
            ))}
          </select>
        ) : null}
      </div>
      <label htmlFor={BODY_ID} className="sr-only">
        Message
      </label>
      <textarea
        id={BODY_ID}
        name="body"
        rows={7}
        value={body}
        onChange={(e) => setBody(e.target.value)}
        hidden={preview}
        aria-describedby={note ? "note-mode-hint" : undefined}
        className={`w-full rounded border px-3 py-2 font-mono text-sm ${note ? "border-amber-400 bg-amber-100/60" : "border-stone-300 bg-white"}`}
      />
      {preview ? (
        <div className="min-h-24 rounded border border-dashed border-stone-300 p-3">
          <SafeMarkdown source={body || "_Nothing to preview._"} />
        </div>
      ) : null}
      {errors.body ? (
        <p className="text-sm text-red-800">
          <span aria-hidden>⚠ </span>
          {errors.body.join(" ")}
        </p>
      ) : null}
      <fieldset className="grid gap-2 text-sm sm:grid-cols-2">
        <legend className="font-medium">Embed a sheet adapted to the customer&apos;s machine</legend>
        <div className="flex flex-col sm:col-span-2">
          <label htmlFor="f-version-find">Find a sheet version</label>
          <input
            id="f-version-find"
            type="search"
            className={field}
            value={picker.query}
            onChange={(e) => picker.setQuery(e.target.value)}
            // Enter looks up; it must not send the reply.
            onKeyDown={(e) => e.key === "Enter" && e.preventDefault()}
            placeholder="Words of the title, cutter SKU, material or machine class"
            aria-describedby="version-find-hint"
          />
          <span id="version-find-hint" className="text-xs text-stone-600" aria-live="polite">
            {picker.hint}
          </span>
        </div>
        <label className="flex flex-col">
          Sheet version
          <select
            name="cardSheetVersionId"
            className={field}
            value={versionId}
            onChange={(e) => {
              setVersionId(e.target.value);
              setChosen(groups.flatMap((g) => g.items).find((v) => v.id === e.target.value) ?? null);
            }}
          >
            <option value="">No sheet</option>
            {shownGroups.map((g) => (
              <optgroup key={g.label} label={g.label}>
                {g.items.map((v) => (
                  <option key={v.id} value={v.id}>
                    {v.name}
                  </option>
                ))}
              </optgroup>
            ))}
          </select>
        </label>
        <label className="flex flex-col">
          Customer&apos;s machine
          <select name="cardMachineId" className={field} defaultValue={defaultMachineId ?? machines[0]?.id ?? ""}>
            <option value="">—</option>
            {machines.map((m) => (
              <option key={m.id} value={m.id}>
                {m.name}
              </option>
            ))}
          </select>
        </label>
        {errors.cardMachineId || errors.cardSheetVersionId ? (
          <p className="text-red-800 sm:col-span-2">
            <span aria-hidden>⚠ </span>
            {[...(errors.cardMachineId ?? []), ...(errors.cardSheetVersionId ?? [])].join(" ")}
          </p>
        ) : null}
        {versionId && !machines.length ? (
          <p className="text-amber-900 sm:col-span-2">
            <span aria-hidden>⚠ </span>The customer has no saved machine, so the sheet cannot be adapted.
          </p>
        ) : null}
      </fieldset>
      <UploadField key={sent} vendor={vendor} label="Attach files" />
      <FormMessage state={state} success={state.message} />
      <SubmitButton pendingText="Sending…">{note ? "Add internal note" : "Send reply"}</SubmitButton>
    </form>
  );
}
