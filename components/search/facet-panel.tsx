"use client";

import type { FacetCounts, FacetName } from "@/search/engines/engine-types";

import { FACET_PARAM, FACET_TITLES, facetValueLabel } from "./facet-labels";

type Props = {
  facets: FacetCounts;
  selected: Partial<Record<string, string>>;
  names: ReadonlyMap<string, string>;
  onSelect: (param: string, value: string) => void;
};

const ORDER: FacetName[] = ["materialKey", "operations", "diameterMm", "flutes", "machineClass"];

/** Counts of the matching sheets per material, operation, diameter, flute count and machine class. */
export function FacetPanel({ facets, selected, names, onSelect }: Props) {
  return (
    <aside aria-label="Refine" className="space-y-5">
      {ORDER.filter((f) => facets[f]?.length).map((facet) => {
        const param = FACET_PARAM[facet];
        return (
          <section key={facet} aria-labelledby={`facet-${facet}`}>
            <h2 id={`facet-${facet}`} className="mb-1 text-sm font-semibold text-stone-700">
              {FACET_TITLES[facet]}
            </h2>
            <ul className="space-y-1" data-facet={facet}>
              {facets[facet]!.slice(0, 8).map(({ value, count }) => {
                const label = facetValueLabel(facet, value, names);
                const active = param !== undefined && selected[param] === value;
                const body = (
                  <>
                    <span>{label}</span>
                    <span className="num text-stone-500" aria-label={`${count} ${count === 1 ? "sheet" : "sheets"}`}>
                      {count}
                    </span>
                  </>
                );
                return (
                  <li key={value}>
                    {param ? (
                      <button
                        type="button"
                        aria-pressed={active}
                        onClick={() => onSelect(param, value)}
                        data-facet-button
                        className={`flex min-h-11 w-full items-center gap-2 rounded border px-2 text-left text-sm hover:border-stone-500 ${active ? "border-stone-700 bg-stone-100 font-medium" : "border-stone-300 bg-white"}`}
                      >
                        {/* A box that shows on and off, so the choice looks like a control and not like text. */}
                        <span
                          aria-hidden
                          className={`inline-flex h-4 w-4 shrink-0 items-center justify-center rounded-sm border text-[10px] leading-none ${active ? "border-stone-800 bg-stone-800 text-white" : "border-stone-500 bg-white"}`}
                        >
                          {active ? "✓" : ""}
                        </span>
                        <span className="flex flex-1 items-center justify-between gap-3">{body}</span>
                      </button>
                    ) : (
                      <div className="flex min-h-9 items-center justify-between gap-3 px-2 text-sm">{body}</div>
                    )}
                  </li>
                );
              })}
            </ul>
          </section>
        );
      })}
    </aside>
  );
}
