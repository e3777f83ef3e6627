"use client";

import { useActionState } from "react";

import { initialActionState, type FormAction } from "@/lib/actions/action-state";

// Always mounted, so screen readers announce the message when it appears.
function Status({ state }: { state: { ok: boolean; message?: string } }) {
  return (
    <p role="status" aria-live="polite" className={state.ok ? "text-sm text-green-800" : "text-sm text-red-800"}>
      {state.message ?? ""}
    </p>
  );
}

/** The weekly digest for the signed-in engineer: on or off, and "send it to me now". */
export function DigestControls({
  vendorSlug,
  enabled,
  sendDigestNowAction,
  setWeeklyDigestAction,
}: {
  vendorSlug: string;
  enabled: boolean;
  sendDigestNowAction: FormAction;
  setWeeklyDigestAction: FormAction;
}) {
  const [sendState, send, sending] = useActionState(sendDigestNowAction, initialActionState);
  const [toggleState, toggle, toggling] = useActionState(setWeeklyDigestAction, initialActionState);
  return (
    <div className="flex flex-wrap items-center gap-3 text-sm">
      <form action={send}>
        <input type="hidden" name="vendor" value={vendorSlug} />
        <button type="submit" disabled={sending} className="min-h-11 rounded bg-accent px-4 py-2 font-medium text-accent-ink">
          Send me this week’s digest
        </button>
      </form>
      <form action={toggle} className="flex items-center gap-2">
        <input type="hidden" name="vendor" value={vendorSlug} />
        <input type="hidden" name="enabled" value={enabled ? "off" : "on"} />
        <span>
          Weekly digest (Mondays): <strong>{enabled ? "on" : "off"}</strong>
        </span>
        <button type="submit" disabled={toggling} className="min-h-11 rounded border border-stone-300 bg-white px-3">
          {enabled ? "Stop the weekly digest" : "Send me the weekly digest"}
        </button>
      </form>
      <Status state={sendState} />
      <Status state={toggleState} />
    </div>
  );
}
