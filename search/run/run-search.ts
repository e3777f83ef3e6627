import { LruCache } from "@/lib/mdx/lru-cache";
import { describeQuery, looserQueries } from "@/search/parse/looser-queries";
import { parseQuery } from "@/search/parse/parse-query";
import type { ParsedQuery } from "@/search/parse/types";
import { oneWaySynonyms, synonymGroups } from "@/search/vocabulary/synonyms";

import type { EngineQuery, EngineResult, SearchEngine } from "../engines/engine-types";
import { correctTypos, type Correction } from "./correct-typos";
import { highlighter, type HighlightRange } from "./highlight";
import { planSearch, type ExplicitFilters } from "./plan-search";
import type { SearchResponse } from "./search-response";
import { highlightTerms, toHit } from "./to-hit";

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

/** Everything about a search that depends on its text, filters and page alone (not on the vendor or the index). */
type SearchPlanOfText = {
  /** Names the text, filters and page: equal keys, equal plans. */
  key: string;
  parsed: ParsedQuery;
  corrections: Correction[];
  page: number;
  perPage: number;
  /** Engine queries strictest first, without the vendor. */
  steps: { query: Omit<EngineQuery, "vendorId">; dropped: SearchResponse["relaxed"] }[];
  mark: (text: string) => HighlightRange[];
  looser: string[];
  description: string;
  /** The steps' engine queries of each vendor that searched this text lately (a search builds them once). */
  byVendor: Map<string, EngineQuery[]>;
};

function planOfText(key: string, q: string, filters: ExplicitFilters | undefined, page: number, perPage: number): SearchPlanOfText {
  const { parsed, corrections } = correctTypos(parseQuery(q));
  const words = parsed.text.split(" ").filter(Boolean);
  const plan = planSearch(parsed, filters);
  const base = { words, alternatives: alternativesOf(words), prefix: prefixOf(q, parsed), boosts: plan.boosts, page, perPage };
  return {
    key,
    parsed,
    corrections,
    page,
    perPage,
    steps: plan.steps.map((step) => ({ query: { ...base, filters: step.filters }, dropped: step.dropped })),
    mark: highlighter(highlightTerms(parsed, corrections)),
    looser: looserQueries(parsed),
    description: describeQuery(parsed),
    byVendor: new Map(),
  };
}

const VENDORS_PER_PLAN = 64;

/** The engine queries of `plan` for one vendor, strictest first (shared by its searches: never changed). */
function vendorQueries(plan: SearchPlanOfText, vendorId: string): EngineQuery[] {
  let queries = plan.byVendor.get(vendorId);
  if (!queries) {
    if (plan.byVendor.size >= VENDORS_PER_PLAN) plan.byVendor.clear();
    queries = plan.steps.map((s) => ({ ...s.query, vendorId }));
    plan.byVendor.set(vendorId, queries);
  }
  return queries;
}

// Parsing, typo correction and planning are pure functions of the text; searches repeat (typeahead, popular
// queries, every vendor's customers), so the last few hundred plans are kept.
const recentPlans = new LruCache<string, SearchPlanOfText>(500);

function textPlan(req: SearchRequest): SearchPlanOfText {
  const page = Math.max(1, req.page ?? 1);
  const perPage = Math.min(50, Math.max(1, req.perPage ?? 20));
  const key = JSON.stringify([req.q, req.filters ?? null, page, perPage]);
  const known = recentPlans.get(key);
  if (known) return known;
  const plan = planOfText(key, req.q, req.filters, page, perPage);
  recentPlans.set(key, plan);
  return plan;
}

/** The engine queries of a search, strictest first (exported for the benchmark's query plan). */
export function engineQueriesFor(req: SearchRequest) {
  const { parsed, corrections, page, perPage, steps } = textPlan(req);
  return {
    parsed,
    corrections,
    page,
    perPage,
    steps: steps.map((s) => ({ query: { ...s.query, vendorId: req.vendorId } satisfies EngineQuery, dropped: s.dropped })),
  };
}

/** Parse → plan → engine (relaxing filters while nothing matches) → hits with highlight ranges and facets. */
export async function runSearch(engine: SearchEngine, req: SearchRequest): Promise<SearchResponse> {
  const plan = textPlan(req);
  const { parsed, corrections, page, perPage } = plan;
  const queries = vendorQueries(plan, req.vendorId);
  let result: EngineResult = { total: 0, hits: [], facets: {}, cutters: [] };
  let relaxed: SearchResponse["relaxed"] = [];
  if (engine.searchSteps) {
    const found = await engine.searchSteps(queries, plan.key);
    result = found.result;
    relaxed = plan.steps[found.step].dropped;
  } else {
    for (const [i, query] of queries.entries()) {
      result = await engine.search(query);
      relaxed = plan.steps[i].dropped;
      if (result.total > 0) break;
    }
  }
  if (result.total === 0) relaxed = [];
  return {
    query: parsed.query,
    page,
    perPage,
    total: result.total,
    hits: result.hits.map((h) => toHit(h.doc, plan.mark)),
    facets: result.facets,
    cutters: result.cutters.map((c) => ({ sku: c.cutterSku, name: c.cutterName, diameterMm: c.diameterMm, flutes: c.flutes })),
    chips: [...parsed.chips],
    corrections: [...corrections],
    relaxed: [...relaxed],
    suggestions: result.total === 0 || relaxed.length ? [...plan.looser] : [],
    description: plan.description,
    engine: engine.name,
  };
}
