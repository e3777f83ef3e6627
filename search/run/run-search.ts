import { describeQuery, looserQueries } from "@/search/parse/looser-queries";
import { parseQuery } from "@/search/parse/parse-query";
import type { ParsedQuery } from "@/search/parse/types";
import { oneWaySynonyms, synonymGroups } from "@/search/vocabulary/synonyms";

import type { EngineQuery, EngineResult, SearchEngine } from "../engines/engine-types";
import { correctTypos } from "./correct-typos";
import { toHits } from "./to-hit";
import { type ExplicitFilters, planSearch } from "./plan-search";
import type { SearchResponse } from "./search-response";

export type SearchRequest = { vendorId: string; q: string; filters?: ExplicitFilters; page?: number; perPage?: number };

function alternativesOf(words: readonly string[]): string[] {
  const out = new Set<string>();
  for (const w of words) {
    for (const group of synonymGroups) if (group.includes(w)) group.forEach((g) => out.add(g));
    for (const g of oneWaySynonyms[w] ?? []) out.add(g);
  }
  words.forEach((w) => out.delete(w));
  return [...out];
}

/** The word being typed: the query's last word, unless the user has typed a space after it. */
function prefixOf(raw: string, parsed: ParsedQuery): string | undefined {
  const last = parsed.text.split(" ").at(-1);
  return last && !/\s$/.test(raw) && parsed.query.toLowerCase().endsWith(last) ? last : undefined;
}

/** The engine queries of a search, strictest first (exported for the benchmark's query plan). */
export function engineQueriesFor(req: SearchRequest) {
  const page = Math.max(1, req.page ?? 1);
  const perPage = Math.min(50, Math.max(1, req.perPage ?? 20));
  const { parsed, corrections } = correctTypos(parseQuery(req.q));
  const words = parsed.text.split(" ").filter(Boolean);
  const plan = planSearch(parsed, req.filters);
  const base = { vendorId: req.vendorId, words, alternatives: alternativesOf(words), prefix: prefixOf(req.q, parsed), boosts: plan.boosts, page, perPage };
  return { parsed, corrections, page, perPage, steps: plan.steps.map((step) => ({ query: { ...base, filters: step.filters } satisfies EngineQuery, dropped: step.dropped })) };
}

/** Parse → plan → engine (relaxing filters while nothing matches) → hits with highlight ranges and facets. */
export async function runSearch(engine: SearchEngine, req: SearchRequest): Promise<SearchResponse> {
  const { parsed, corrections, page, perPage, steps } = engineQueriesFor(req);
  let result: EngineResult = { total: 0, hits: [], facets: {}, cutters: [] };
  let relaxed: SearchResponse["relaxed"] = [];
  if (engine.searchSteps) {
    const found = await engine.searchSteps(steps.map((s) => s.query));
    result = found.result;
    relaxed = steps[found.step].dropped;
  } else {
    for (const step of steps) {
      result = await engine.search(step.query);
      relaxed = step.dropped;
      if (result.total > 0) break;
    }
  }
  if (result.total === 0) relaxed = [];
  return {
    query: parsed.query,
    page,
    perPage,
    total: result.total,
    hits: toHits(result.hits.map((h) => h.doc), parsed, corrections),
    facets: result.facets,
    cutters: result.cutters.map((c) => ({ sku: c.cutterSku, name: c.cutterName, diameterMm: c.diameterMm, flutes: c.flutes })),
    chips: parsed.chips,
    corrections,
    relaxed,
    suggestions: result.total === 0 || relaxed.length ? looserQueries(parsed) : [],
    description: describeQuery(parsed),
    engine: engine.name,
  };
}
