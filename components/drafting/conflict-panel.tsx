"use client";

type Props = { mine: string; theirs: string; theirRevision: number; by: string | null; onKeepMine: () => void; onTakeTheirs: () => void };

/** A stale save: both texts side by side, nothing thrown away until the engineer chooses. */
export function ConflictPanel({ mine, theirs, theirRevision, by, onKeepMine, onTakeTheirs }: Props) {
  return (
    <section
      role="alert"
      aria-labelledby="conflict-heading"
      className="mb-4 rounded-md border border-red-300 border-l-4 border-l-red-700 bg-red-50 p-4"
    >
      <h2 id="conflict-heading" className="font-semibold text-red-950">
        ⚠ Conflict: {by ?? "someone"} saved this draft (revision {theirRevision}) while you were editing
      </h2>
      <p className="mt-1 text-sm text-red-950">
        Your text is not saved yet and nothing was overwritten. Compare, then choose; you can copy from either side first.
      </p>
      <div className="mt-3 grid gap-3 md:grid-cols-2">
        <label className="flex flex-col gap-1 text-sm font-medium">
          Your text
          <textarea readOnly value={mine} rows={12} className="rounded border border-stone-300 bg-white p-2 font-mono text-xs" />
        </label>
        <label className="flex flex-col gap-1 text-sm font-medium">
          Their text (revision {theirRevision})
          <textarea readOnly value={theirs} rows={12} className="rounded border border-stone-300 bg-white p-2 font-mono text-xs" />
        </label>
      </div>
      <div className="mt-3 flex flex-wrap gap-2">
        <button type="button" onClick={onKeepMine} className="min-h-11 rounded bg-accent px-4 py-2 font-medium text-accent-ink">
          Save my text over theirs
        </button>
        <button type="button" onClick={onTakeTheirs} className="min-h-11 rounded border border-stone-300 bg-white px-4 py-2 font-medium">
          Take their text
        </button>
      </div>
    </section>
  );
}
