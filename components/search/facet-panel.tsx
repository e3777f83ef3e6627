"use client";

import type { FacetCounts, FacetName } from "@/search/engines/engine-types";

import { FACET_PARAM, FACET_TITLES, facetValueLabel } from "./facet-labels";

type Props = { facets: FacetCounts; selected: Partial<Record<string, string>>; names: ReadonlyMap<string, string>; onSelect: (param: string, value: string) => void };

const ORDER: FacetName[] = ["materialKey", "operations", "diameterMm", "flutes", "machineClass"];

/** Counts of the matching sheets per material, operation, diameter, flute count and machine class. */
export function FacetPanel({ facets, selected, names, onSelect }: Props) {
  return (
    <aside aria-label="Refine" className="space-y-5">
      {ORDER.filter((f) => facets[f]?.length).map((facet) => {
        const param = FACET_PARAM[facet];
        return (
          <section key={facet} aria-labelledby={`facet-${facet}`}>
            <h2 id={`facet-${facet}`} className="mb-1 text-sm font-semibold text-stone-700">{FACET_TITLES[facet]}</h2>
            <ul className="space-y-0.5" data-facet={facet}>
              {facets[facet]!.slice(0, 8).map(({ value, count }) => {
                const label = facetValueLabel(facet, value, names);
                const active = param !== undefined && selected[param] === value;
                const body = (
                  <>
                    <span>{label}</span>
                    <span className="num text-stone-500" aria-label={`${count} ${count === 1 ? "sheet" : "sheets"}`}>{count}</span>
                  </>
                );
                return (
                  <li key={value}>
                    {param ? (
                      <button
                        type="button"
                        aria-pressed={active}
                        onClick={() => onSelect(param, value)}
                        className={`flex min-h-11 w-full items-center justify-between gap-3 rounded px-2 text-left text-sm hover:bg-stone-100 ${active ? "bg-stone-200 font-medium" : ""}`}
                      >
                        {body}
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
