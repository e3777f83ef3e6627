"use client";

import { X } from "./x-icon";

export type ChipView = { id: string; label: string; kind: string; onRemove: () => void };

/** The parts of the query the search understood, each removable. */
export function QueryChips({ chips }: { chips: readonly ChipView[] }) {
  if (chips.length === 0) return null;
  return (
    <ul aria-label="Understood parts of the query" className="flex flex-wrap gap-2">
      {chips.map((chip) => (
        <li key={chip.id}>
          <button
            type="button"
            onClick={chip.onRemove}
            aria-label={`Remove ${chip.label}`}
            data-chip-kind={chip.kind}
            className="inline-flex min-h-11 items-center gap-1.5 rounded-full border border-stone-300 bg-white px-3 text-sm hover:border-stone-500 focus-visible:outline-2 focus-visible:outline-offset-2"
          >
            <span>{chip.label}</span>
            <X />
          </button>
        </li>
      ))}
    </ul>
  );
}
