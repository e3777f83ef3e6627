"use client";

import { ENTRY_CAPABILITY_KEYS, entryCapabilityLabels, type EntryCapabilityKey } from "@/content-schema/entry-capability-labels";

const HINTS: Record<EntryCapabilityKey, string> = {
  "plunge-only": "The cutter goes straight down into the material.",
  ramp: "The cutter slopes down along the path.",
  helix: "The cutter spirals down; a ramp works too.",
};

/** What the customer's CAM can do to enter the material; it decides the plunge and the depth per pass. */
export function EntryCapabilityPicker({ value, onChange }: { value: EntryCapabilityKey; onChange: (value: EntryCapabilityKey) => void }) {
  return (
    <fieldset className="space-y-2">
      <legend className="text-sm font-semibold">How does your CAM enter the material?</legend>
      <div className="grid gap-2 sm:grid-cols-3">
        {ENTRY_CAPABILITY_KEYS.map((key) => (
          <label
            key={key}
            className={`flex min-h-11 cursor-pointer flex-col rounded border px-3 py-2 text-sm ${value === key ? "border-stone-900 bg-stone-100" : "border-stone-300 bg-white"}`}
          >
            <span className="flex items-center gap-2 font-medium">
              <input
                type="radio"
                name="entry-capability"
                value={key}
                checked={value === key}
                onChange={() => onChange(key)}
                className="size-4"
              />
              {entryCapabilityLabels[key]}
            </span>
            <span className="mt-1 text-xs text-stone-600">{HINTS[key]}</span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
