"use client";

import { useCallback, useEffect, useRef, useState } from "react";

import { useKeptText } from "@/components/forms/use-kept-text";
import { initialActionState, type ActionState } from "@/lib/actions/action-state";

export type Conflict = { source: string; revision: number; updatedByName: string | null };
type SaveData = { revision?: number; valid?: boolean; conflict?: Conflict };
export type DraftAction = (s: ActionState, input: Record<string, unknown>) => Promise<ActionState>;
export type SaveStatus = "saved" | "unsaved" | "saving" | "conflict" | "error";

const AUTOSAVE_DELAY_MS = 1500;

/**
 * The draft's text and its saving: saves with the revision it was loaded at, autosaves after a pause, and holds a
 * conflict (someone else saved meanwhile) until the author keeps theirs or takes the other text.
 */
export function useDraftAutosave({
  base,
  initialSource,
  initialRevision,
  saveAction,
  fieldId,
}: {
  base: { vendor: string; slug: string };
  initialSource: string;
  /** The source textarea: text typed there before the page hydrated is kept and autosaved. */
  fieldId: string;
  initialRevision: number;
  saveAction: DraftAction;
}) {
  const [source, setSource] = useKeptText(fieldId, initialSource);
  const [revision, setRevision] = useState(initialRevision);
  const [saved, setSaved] = useState(initialSource);
  const [status, setStatus] = useState<SaveStatus>("saved");
  const [message, setMessage] = useState<string | null>(null);
  const [conflict, setConflict] = useState<Conflict | null>(null);
  // The latest action prop, so a re-render of the page (or a hot reload) does not restart the timers.
  const action = useRef(saveAction);
  useEffect(() => {
    action.current = saveAction;
  });
  const saving = useRef(false);

  const save = useCallback(
    async (text: string, atRevision: number) => {
      if (saving.current) return false;
      saving.current = true;
      setStatus("saving");
      let result: ActionState<SaveData>;
      try {
        result = (await action.current(initialActionState, { ...base, source: text, revision: atRevision })) as ActionState<SaveData>;
      } catch {
        result = { ok: false, message: "The server did not answer. Your text is still here; try again." };
      } finally {
        saving.current = false;
      }
      if (result.ok && result.data?.revision !== undefined) {
        setRevision(result.data.revision);
        setSaved(text);
        setConflict(null);
        setMessage(null);
        setStatus("saved");
        return true;
      } else if (result.data?.conflict) {
        setConflict(result.data.conflict);
        setStatus("conflict");
      } else {
        setMessage(result.message ?? "Not saved.");
        setStatus("error");
      }
      return false;
    },
    [base],
  );

  // Autosave, debounced; paused while a conflict waits for a decision.
  useEffect(() => {
    if (source === saved || conflict) return;
    const timer = setTimeout(() => void save(source, revision), AUTOSAVE_DELAY_MS);
    return () => clearTimeout(timer);
  }, [source, saved, conflict, revision, save]);

  const takeTheirs = (theirs: Conflict) => {
    setSource(theirs.source);
    setSaved(theirs.source);
    setRevision(theirs.revision);
    setConflict(null);
    setStatus("saved");
  };

  const shown: SaveStatus = status === "saved" && source !== saved ? "unsaved" : status;
  return { source, setSource, revision, saved, status, shown, message, conflict, save, takeTheirs };
}
