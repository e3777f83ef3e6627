"use client";

import { ActionForm } from "@/components/drafting/action-form";
import { KeptTextarea } from "@/components/forms/kept-textarea";
import type { ActionState } from "@/lib/actions/action-state";

type Props = {
  action: (s: ActionState, f: FormData) => Promise<ActionState>;
  vendorSlug: string;
  family: string;
  text: string;
  version: number;
};

/** The family's rules as YAML; saving makes a new rules version (the same rules again make none). */
export function RulesForm({ action, vendorSlug, family, text, version }: Props) {
  return (
    <ActionForm action={action} hidden={{ vendor: vendorSlug, family }} submitLabel="Save as a new rules version" label="Family rules">
      {(errors, sent) => {
        const ruleErrors = Object.entries(errors)
          .filter(([k]) => k === "rules" || k.startsWith("rules."))
          .map(([k, v]) => `${k.replace(/^rules\.?/, "") || "rules"}: ${v.join(" ")}`);
        return (
          <>
            <label className="flex flex-col gap-1 text-sm font-medium">
              Rules (version {version})
              <KeptTextarea
                id="family-rules"
                name="rules"
                rows={14}
                spellCheck={false}
                defaultValue={sent.values?.rules ?? text}
                aria-invalid={ruleErrors.length ? true : undefined}
                aria-describedby="rules-help"
                className="rounded border border-stone-300 p-2 font-mono text-sm font-normal"
              />
            </label>
            <p id="rules-help" className="text-xs text-stone-600">
              Each rule names a materialGroup and kind, optionally one machineClass (slug), and any of: vcPosition and chipLoadPosition (0 =
              lowest, 1 = highest in the material&apos;s window and band), apPerD and aePerD (multiples of D), entry, rampAngleDeg. What no
              rule sets comes from the material&apos;s own data.
            </p>
            {ruleErrors.length ? (
              <ul className="text-sm text-red-800">
                {ruleErrors.map((e) => (
                  <li key={e}>
                    <span aria-hidden>⚠ </span>
                    {e}
                  </li>
                ))}
              </ul>
            ) : null}
            <label className="flex flex-col gap-1 text-sm font-medium">
              What changes
              <input
                name="note"
                required
                minLength={3}
                defaultValue={sent.values?.note}
                className="min-h-11 rounded border border-stone-300 px-3 font-normal"
              />
            </label>
            {errors.note ? <p className="text-sm text-red-800">⚠ {errors.note.join(" ")}</p> : null}
          </>
        );
      }}
    </ActionForm>
  );
}
