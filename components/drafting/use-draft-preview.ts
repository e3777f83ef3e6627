"use client";

import { useEffect, useRef, useState, useTransition, type ReactNode } from "react";

import { initialActionState, type ActionState } from "@/lib/actions/action-state";
import type { SheetIssue } from "@/lib/mdx/sheet-issue";

import type { DraftAction } from "./use-draft-autosave";

type PreviewData = { issues: SheetIssue[]; valid: boolean; preview: ReactNode; renderError: string | null };

const PREVIEW_DELAY_MS = 400;

/** The live preview and the problem list of the text being edited, asked of the server after a short pause. */
export function useDraftPreview({
  base,
  source,
  previewAction,
}: {
  base: { vendor: string; slug: string };
  source: string;
  previewAction: DraftAction;
}) {
  const [issues, setIssues] = useState<SheetIssue[]>([]);
  const [preview, setPreview] = useState<ReactNode>(null);
  const [renderError, setRenderError] = useState<string | null>(null);
  const [, startPreview] = useTransition();
  const action = useRef(previewAction);
  useEffect(() => {
    action.current = previewAction;
  });

  useEffect(() => {
    const timer = setTimeout(() => {
      startPreview(async () => {
        const result = (await action.current(initialActionState, { ...base, source }).catch(() => null)) as ActionState<PreviewData> | null;
        if (result?.ok && result.data) {
          setIssues(result.data.issues);
          setPreview(result.data.preview);
          setRenderError(result.data.renderError);
        }
      });
    }, PREVIEW_DELAY_MS);
    return () => clearTimeout(timer);
  }, [source, base]);

  return { issues, preview, renderError };
}
