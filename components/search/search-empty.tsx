"use client";

import { EmptyState } from "@/components/ui/empty-state";

/** Nothing matched: what was understood, and looser queries to try. */
export function SearchEmpty({
  description,
  suggestions,
  onTry,
}: {
  description: string;
  suggestions: readonly string[];
  onTry: (q: string) => void;
}) {
  return (
    <EmptyState title="No published sheet matches this search.">
      {description ? <p>Searched for {description}.</p> : null}
      {suggestions.length ? (
        <div className="mt-3">
          <p>Try a looser search:</p>
          <ul className="mt-2 flex flex-wrap justify-center gap-2">
            {suggestions.map((s) => (
              <li key={s}>
                <button
                  type="button"
                  onClick={() => onTry(s)}
                  className="min-h-11 rounded border border-stone-300 bg-white px-3 text-stone-800 hover:border-stone-500"
                >
                  {s}
                </button>
              </li>
            ))}
          </ul>
        </div>
      ) : (
        <p>Try fewer words, or a material and a cutter diameter such as “6 mm MDF”.</p>
      )}
    </EmptyState>
  );
}
