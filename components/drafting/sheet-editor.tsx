"use client";

import { useMemo, useRef, useState, useTransition } from "react";

import { useKeptText } from "@/components/forms/use-kept-text";
import { initialActionState } from "@/lib/actions/action-state";

import { ConflictPanel } from "./conflict-panel";
import { IssueList } from "./issue-list";
import { LINE_HEIGHT_PX, LineNumberedSource, SHEET_SOURCE_ID } from "./line-numbered-source";
import { useDraftAutosave, type DraftAction, type SaveStatus } from "./use-draft-autosave";
import { useDraftPreview } from "./use-draft-preview";

type Props = {
  vendorSlug: string;
  slug: string;
  initialSource: string;
  initialRevision: number;
  /** A change note the draft started with (a draft started from Field results cites its reports). */
  initialChangeNote?: string;
  saveAction: DraftAction;
  previewAction: DraftAction;
  submitAction: DraftAction;
};

const STATUS_TEXT: Record<SaveStatus, string> = {
  saved: "✓ All changes saved",
  unsaved: "● Unsaved changes",
  saving: "Saving…",
  conflict: "⚠ Not saved: conflict",
  error: "⚠ Not saved",
};

/** Source with line numbers beside a live preview; autosaves with the revision it was loaded at. */
export function SheetEditor({
  vendorSlug,
  slug,
  initialSource,
  initialRevision,
  initialChangeNote = "",
  saveAction,
  previewAction,
  submitAction,
}: Props) {
  const base = useMemo(() => ({ vendor: vendorSlug, slug }), [vendorSlug, slug]);
  const { source, setSource, revision, saved, status, shown, message, conflict, save, takeTheirs } = useDraftAutosave({
    base,
    initialSource,
    initialRevision,
    saveAction,
    fieldId: SHEET_SOURCE_ID,
  });
  const { issues, preview, renderError } = useDraftPreview({ base, source, previewAction });
  const [submitting, startSubmit] = useTransition();
  const [changeNote, setChangeNote] = useKeptText("change-note", initialChangeNote);
  const [submitError, setSubmitError] = useState<string | null>(null);
  const area = useRef<HTMLTextAreaElement>(null);

  const jumpTo = (line: number) => {
    const el = area.current;
    if (!el) return;
    const lines = source.split("\n");
    const start = lines.slice(0, line - 1).reduce((n, l) => n + l.length + 1, 0);
    el.focus();
    el.setSelectionRange(start, start + (lines[line - 1]?.length ?? 0));
    el.scrollTop = Math.max(0, (line - 4) * LINE_HEIGHT_PX);
  };

  const invalidLines = useMemo(() => new Set(issues.filter((i) => i.severity === "error").map((i) => i.line)), [issues]);
  const errorCount = invalidLines.size;

  return (
    <div data-editor data-revision={revision} data-status={shown}>
      {conflict ? (
        <ConflictPanel
          mine={source}
          theirs={conflict.source}
          theirRevision={conflict.revision}
          by={conflict.updatedByName}
          onKeepMine={() => void save(source, conflict.revision)}
          onTakeTheirs={() => takeTheirs(conflict)}
        />
      ) : null}
      <div className="mb-2 flex flex-wrap items-center gap-3 text-sm">
        <span
          role="status"
          aria-live="polite"
          className={shown === "saved" ? "text-green-800" : shown === "conflict" || shown === "error" ? "text-red-800" : "text-stone-700"}
        >
          {STATUS_TEXT[shown]}
        </span>
        <span className="num text-stone-500">revision {revision}</span>
        <button
          type="button"
          onClick={() => void save(source, revision)}
          disabled={status === "saving" || Boolean(conflict)}
          className="min-h-11 rounded border border-stone-300 bg-white px-3 font-medium disabled:opacity-50"
        >
          Save now
        </button>
        {message ? (
          <span role="alert" className="text-red-800">
            {message}
          </span>
        ) : null}
      </div>
      <div className="grid gap-4 lg:grid-cols-2">
        <div>
          <LineNumberedSource
            ref={area}
            value={source}
            onChange={setSource}
            label="Sheet source (YAML front matter and MDX)"
            invalidLines={invalidLines}
          />
          <section aria-labelledby="issues-heading" className="mt-3 rounded-md border border-stone-300 bg-white p-3">
            <h2 id="issues-heading" className="mb-1 text-sm font-semibold">
              Problems {errorCount ? <span className="num text-red-800">({issues.length})</span> : null}
            </h2>
            <IssueList issues={issues} onJump={jumpTo} />
          </section>
          <section aria-labelledby="submit-heading" className="mt-3 rounded-md border border-stone-300 bg-white p-3">
            <h2 id="submit-heading" className="text-sm font-semibold">
              Submit for review
            </h2>
            <label htmlFor="change-note" className="mt-2 block text-sm">
              Change note (required): what changed and why
            </label>
            <textarea
              id="change-note"
              rows={initialChangeNote ? 5 : 2}
              value={changeNote}
              onChange={(e) => setChangeNote(e.target.value)}
              className="mt-1 w-full rounded border border-stone-300 p-2 text-sm"
            />
            {submitError ? (
              <p role="alert" className="mt-1 text-sm text-red-800">
                ⚠ {submitError}
              </p>
            ) : null}
            <button
              type="button"
              disabled={submitting || errorCount > 0 || Boolean(conflict)}
              onClick={() =>
                startSubmit(async () => {
                  setSubmitError(null);
                  if (source !== saved && !(await save(source, revision))) return setSubmitError("Save the draft first.");
                  const result = await submitAction(initialActionState, { ...base, changeNote });
                  if (!result.ok) setSubmitError([result.message, ...Object.values(result.errors ?? {}).flat()].filter(Boolean).join(" "));
                })
              }
              className="mt-2 min-h-11 rounded bg-accent px-4 py-2 font-medium text-accent-ink disabled:opacity-50"
            >
              {submitting ? "Submitting…" : "Submit for review"}
            </button>
            {errorCount > 0 ? <p className="mt-1 text-xs text-stone-600">Fix the problems above to submit.</p> : null}
          </section>
        </div>
        <section aria-label="Preview" className="h-[70vh] overflow-auto rounded-md border border-stone-300 bg-white p-4">
          <p className="mb-2 text-xs uppercase tracking-wider text-stone-500">Preview, as readers will see it</p>
          {renderError ? (
            <p role="alert" className="text-sm text-red-800">
              ⚠ {renderError}
            </p>
          ) : null}
          {preview ?? <p className="text-sm text-stone-600">Fix the problems listed to see the preview.</p>}
        </section>
      </div>
    </div>
  );
}
