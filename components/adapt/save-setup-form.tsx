"use client";

import Link from "next/link";
import { useActionState } from "react";

import type { EntryCapabilityKey } from "@/content-schema/setup-fields";
import { initialActionState, type ActionState } from "@/lib/actions/action-state";
import type { UnitSystem } from "@/lib/machining";

export type SaveSetupAction = (state: ActionState, form: FormData) => Promise<ActionState>;

type Props = {
  action: SaveSetupAction;
  vendorSlug: string;
  versionId: string;
  machineId: string;
  operationIndex: number;
  overridesMm: { radialDepthMm?: number; axialDepthMm?: number; stickoutMm?: number };
  units: UnitSystem;
  entryCapability: EntryCapabilityKey;
};

const mm = (v: number | undefined) => (v === undefined ? "" : `${v} mm`);

/** Saves the adaptation as a setup; only references and overrides are sent, the server computes the numbers. */
export function SaveSetupForm({ action, vendorSlug, versionId, machineId, operationIndex, overridesMm, units, entryCapability }: Props) {
  const [state, formAction, pending] = useActionState(action, initialActionState);
  const saved = state.ok && state.data && typeof state.data === "object" && "id" in state.data ? String(state.data.id) : null;
  return (
    <form action={formAction} className="mt-4 flex flex-wrap items-end gap-3 border-t border-stone-200 pt-4">
      <input type="hidden" name="vendor" value={vendorSlug} />
      <input type="hidden" name="versionId" value={versionId} />
      <input type="hidden" name="machineId" value={machineId} />
      <input type="hidden" name="operationIndex" value={operationIndex} />
      <input type="hidden" name="radialDepthMm" value={mm(overridesMm.radialDepthMm)} />
      <input type="hidden" name="axialDepthMm" value={mm(overridesMm.axialDepthMm)} />
      <input type="hidden" name="stickoutMm" value={mm(overridesMm.stickoutMm)} />
      <input type="hidden" name="units" value={units} />
      <input type="hidden" name="entryCapability" value={entryCapability} />
      <div className="flex min-w-56 flex-1 flex-col gap-1">
        <label htmlFor="setup-name" className="text-sm font-medium">
          Setup name (optional)
        </label>
        <input id="setup-name" name="name" maxLength={120} className="min-h-11 rounded border border-stone-300 bg-white px-3" />
      </div>
      <button type="submit" disabled={pending} className="min-h-11 rounded bg-accent px-4 font-medium text-accent-ink disabled:opacity-60">
        {pending ? "Saving…" : "Save as a setup"}
      </button>
      <div aria-live="polite" className="w-full text-sm">
        {saved ? (
          <p className="text-green-800">
            <span aria-hidden>✓ </span>Saved, pinned to this version.{" "}
            <Link className="underline" href={`/${vendorSlug}/bench/setups/${saved}`}>
              Open the setup
            </Link>
          </p>
        ) : state.message ? (
          <p className="text-red-800">
            <span aria-hidden>⚠ </span>
            {state.message}{" "}
            {Object.values(state.errors ?? {})
              .flat()
              .join(" ")}
          </p>
        ) : null}
      </div>
    </form>
  );
}
