"use client";

import { useRouter } from "next/navigation";
import { type KeyboardEvent, useEffect, useRef, useState } from "react";

import { useSearch } from "@/lib/swr/use-search";
import { removeChip } from "@/search/parse/remove-chip";

import { FacetPanel } from "./facet-panel";
import { facetValueLabel } from "./facet-labels";
import { type ChipView, QueryChips } from "./query-chips";
import { SearchEmpty } from "./search-empty";
import { SearchHitItem } from "./search-hit-item";
import { SearchNotices } from "./search-notices";
import { useSearchUrl } from "./use-search-url";

const DEBOUNCE_MS = 200;
const FILTER_FACET = { material: "materialKey", operation: "operations", diameterMm: "diameterMm", flutes: "flutes" } as const;

export function SearchPageClient({ vendorSlug }: { vendorSlug: string }) {
  const router = useRouter();
  const { state, query, write } = useSearchUrl();
  const urlQ = state.q ?? "";
  const [text, setText] = useState(urlQ);
  const written = useRef(urlQ);
  // The highlighted result belongs to one answer; a new answer starts with none highlighted.
  const [selection, setSelection] = useState({ answer: "", index: -1 });
  const { data, error, isValidating } = useSearch(vendorSlug, query);

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

  const answer = `${data?.query ?? ""}|${data?.total ?? ""}`;
  const active = selection.answer === answer ? selection.index : -1;
  const setActive = (next: number | ((index: number) => number)) =>
    setSelection((s) => {
      const current = s.answer === answer ? s.index : -1;
      return { answer, index: typeof next === "function" ? next(current) : next };
    });

  const hits = data?.hits ?? [];
  const href = (slug: string) => `/${vendorSlug}/library/${slug}`;
  const pushQuery = (q: string) => {
    written.current = q;
    setText(q);
    write({ q, page: undefined }, "push");
  };

  const chips: ChipView[] = [
    ...(data?.chips ?? []).map((c) => ({ id: `${c.kind}:${c.value}`, kind: c.kind, label: c.label, onRemove: () => pushQuery(removeChip(text, c)) })),
    ...(Object.keys(FILTER_FACET) as (keyof typeof FILTER_FACET)[])
      .filter((p) => state[p])
      .map((p) => ({ id: `filter:${p}`, kind: `filter-${p}`, label: facetValueLabel(FILTER_FACET[p], state[p]!), onRemove: () => write({ [p]: undefined, page: undefined }, "push") })),
  ];

  function onKeyDown(event: KeyboardEvent<HTMLInputElement>) {
    if (event.key === "ArrowDown" && hits.length) {
      event.preventDefault();
      setActive((i) => Math.min(i + 1, hits.length - 1));
    } else if (event.key === "ArrowUp" && hits.length) {
      event.preventDefault();
      setActive((i) => Math.max(i - 1, -1));
    } else if (event.key === "Enter") {
      event.preventDefault();
      if (active >= 0 && hits[active]) router.push(href(hits[active].slug));
      else if (text !== written.current) {
        written.current = text;
        write({ q: text, page: undefined }, "replace");
      }
    } else if (event.key === "Escape") {
      setActive(-1);
    }
  }

  return (
    <div className="space-y-4">
      <form role="search" onSubmit={(e) => e.preventDefault()}>
        <label htmlFor="library-search" className="mb-1 block text-sm font-medium">Search the Library</label>
        <input
          id="library-search"
          type="search"
          role="combobox"
          aria-expanded={hits.length > 0}
          aria-controls="search-results"
          aria-autocomplete="list"
          aria-activedescendant={active >= 0 ? `search-hit-${active}` : undefined}
          autoComplete="off"
          spellCheck={false}
          value={text}
          onChange={(e) => setText(e.target.value)}
          onKeyDown={onKeyDown}
          placeholder="e.g. 1/8 acrylic slot, 6 mm MDF, NB-SF-3175"
          className="min-h-12 w-full rounded-lg border border-stone-300 bg-white px-4 text-lg shadow-sm focus:border-stone-600 focus:outline-none"
        />
      </form>
      <QueryChips chips={chips} />
      <SearchNotices data={data} busy={isValidating} failed={Boolean(error)} vendorSlug={vendorSlug} />
      <div className="grid gap-6 md:grid-cols-[14rem_1fr]">
        <div>{data && data.total > 0 ? <FacetPanel facets={data.facets} selected={state} names={new Map(hits.flatMap((h) => (h.machineClass ? [[h.machineClass.slug, h.machineClass.name] as const] : [])))} onSelect={(param, value) => write({ [param]: state[param as keyof typeof state] === value ? undefined : value, page: undefined }, "push")} /> : null}</div>
        <div>
          {data && data.total === 0 ? <SearchEmpty description={data.description} suggestions={data.suggestions} onTry={pushQuery} /> : null}
          <ul id="search-results" role="listbox" aria-label="Matching sheets" className="grid gap-3 lg:grid-cols-2">
            {hits.map((hit, i) => (
              <SearchHitItem key={hit.slug} hit={hit} href={href(hit.slug)} id={`search-hit-${i}`} active={i === active} onHover={() => setActive(i)} onOpen={() => router.push(href(hit.slug))} />
            ))}
          </ul>
        </div>
      </div>
    </div>
  );
}
