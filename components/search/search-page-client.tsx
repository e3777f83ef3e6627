"use client";

import { useEffect, useRef, useState, type KeyboardEvent } from "react";

import { useSearch } from "@/lib/swr/use-search";
import { distinctTitles } from "@/lib/ui/distinct-titles";
import { removeChip } from "@/search/parse/remove-chip";

import { facetValueLabel } from "./facet-labels";
import { FacetPanel } from "./facet-panel";
import { QueryChips, type ChipView } from "./query-chips";
import { SearchEmpty } from "./search-empty";
import { SearchHitItem } from "./search-hit-item";
import { SearchNotices } from "./search-notices";
import { useSearchUrl } from "./use-search-url";

const DEBOUNCE_MS = 200;
const FILTER_FACET = { material: "materialKey", operation: "operations", diameterMm: "diameterMm", flutes: "flutes" } as const;

export function SearchPageClient({ vendorSlug }: { vendorSlug: string }) {
  const { state, query, write } = useSearchUrl();
  const urlQ = state.q ?? "";
  const [text, setText] = useState(urlQ);
  const written = useRef(urlQ);
  const { data, error, isValidating } = useSearch(vendorSlug, query);
  const results = useRef<HTMLOListElement>(null);

  // The URL changed from outside the box (back button, a removed chip): show it.
  useEffect(() => {
    if (urlQ !== written.current) {
      written.current = urlQ;
      setText(urlQ);
    }
  }, [urlQ]);

  useEffect(() => {
    if (text === written.current) return;
    const timer = setTimeout(() => {
      written.current = text;
      write({ q: text, page: undefined }, "replace");
    }, DEBOUNCE_MS);
    return () => clearTimeout(timer);
  }, [text, write]);

  const hits = data?.hits ?? [];
  const distinct = distinctTitles(
    hits,
    (h) => h.title,
    (h) => h.machineClass?.name,
  );
  const titleSuffixes = hits.map((hit, i) => (distinct[i] === hit.title ? undefined : hit.machineClass?.name));
  // Arrow keys move focus between the result links (and back up into the box); Tab works as usual.
  const links = () => Array.from(results.current?.querySelectorAll<HTMLAnchorElement>("a[data-search-hit]") ?? []);
  const moveFrom = (index: number, step: 1 | -1) => {
    const all = links();
    const next = index + step;
    if (next < 0) document.getElementById("library-search")?.focus();
    else all[Math.min(next, all.length - 1)]?.focus();
  };
  const href = (slug: string) => `/${vendorSlug}/library/${slug}`;
  const pushQuery = (q: string) => {
    written.current = q;
    setText(q);
    write({ q, page: undefined }, "push");
  };

  const chips: ChipView[] = [
    ...(data?.chips ?? []).map((c) => ({
      id: `${c.kind}:${c.value}`,
      kind: c.kind,
      label: c.label,
      onRemove: () => pushQuery(removeChip(text, c)),
    })),
    ...(Object.keys(FILTER_FACET) as (keyof typeof FILTER_FACET)[])
      .filter((p) => state[p])
      .map((p) => ({
        id: `filter:${p}`,
        kind: `filter-${p}`,
        label: facetValueLabel(FILTER_FACET[p], state[p]!),
        onRemove: () => write({ [p]: undefined, page: undefined }, "push"),
      })),
  ];

  function onKeyDown(event: KeyboardEvent<HTMLInputElement>) {
    if (event.key === "ArrowDown" && hits.length) {
      event.preventDefault();
      moveFrom(-1, 1);
    } else if (event.key === "Enter") {
      event.preventDefault();
      if (text !== written.current) {
        written.current = text;
        write({ q: text, page: undefined }, "replace");
      }
    }
  }

  const onResultKey = (index: number) => (event: KeyboardEvent<HTMLAnchorElement>) => {
    if (event.key === "ArrowDown" || event.key === "ArrowUp") {
      event.preventDefault();
      moveFrom(index, event.key === "ArrowDown" ? 1 : -1);
    }
  };

  return (
    <div className="space-y-4">
      <form role="search" onSubmit={(e) => e.preventDefault()}>
        <label htmlFor="library-search" className="mb-1 block text-sm font-medium">
          Search the Library
        </label>
        <input
          id="library-search"
          type="search"
          aria-controls="search-results"
          aria-describedby="search-keys-hint"
          autoComplete="off"
          spellCheck={false}
          value={text}
          onChange={(e) => setText(e.target.value)}
          onKeyDown={onKeyDown}
          placeholder="e.g. 1/8 acrylic slot, 6 mm MDF, NB-SF-3175"
          className="min-h-12 w-full rounded-lg border border-stone-300 bg-white px-4 text-lg shadow-sm focus:border-stone-600 focus:outline-none"
        />
        <p id="search-keys-hint" className="mt-1 text-xs text-stone-600">
          Results update as you type. Tab or ↓ moves into them.
        </p>
      </form>
      <QueryChips chips={chips} />
      <SearchNotices data={data} busy={isValidating} failed={Boolean(error)} vendorSlug={vendorSlug} />
      <div className="grid gap-6 md:grid-cols-[14rem_1fr]">
        <div>
          {data && data.total > 0 ? (
            <FacetPanel
              facets={data.facets}
              selected={state}
              names={new Map(hits.flatMap((h) => (h.machineClass ? [[h.machineClass.slug, h.machineClass.name] as const] : [])))}
              onSelect={(param, value) =>
                write({ [param]: state[param as keyof typeof state] === value ? undefined : value, page: undefined }, "push")
              }
            />
          ) : null}
        </div>
        <div>
          {data && data.total === 0 ? (
            <SearchEmpty description={data.description} suggestions={data.suggestions} onTry={pushQuery} />
          ) : null}
          <ol ref={results} id="search-results" aria-label="Matching sheets" className="grid gap-3 lg:grid-cols-2">
            {hits.map((hit, i) => (
              <SearchHitItem key={hit.slug} hit={hit} href={href(hit.slug)} titleSuffix={titleSuffixes[i]} onKeyDown={onResultKey(i)} />
            ))}
          </ol>
        </div>
      </div>
    </div>
  );
}
