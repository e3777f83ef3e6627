import type { Knex } from "knex";

import { LruCache } from "@/lib/mdx/lru-cache";

import type { EngineQuery, EngineResult, FacetCounts, FacetName, SearchEngine } from "../engine-types";
import { compareFacetValues } from "../facet-order";
import { rowToDoc } from "./pg-columns";
import { buildFirstMatchingStepSql, buildSearchSql } from "./pg-search-sql";
import { removeRows, replaceVendorRows, upsertRows } from "./pg-write";
import { numberPlaceholders, preparedQuery, runNative, type NativeStatement } from "./prepared-query";

type Raw = {
  total: number;
  hits: Record<string, unknown>[];
  facets: { facet: FacetName; value: string; count: number }[];
  cutters: Record<string, unknown>[];
};

function facetCounts(rows: Raw["facets"]): FacetCounts {
  const out: FacetCounts = {};
  for (const { facet, value, count } of rows) (out[facet] ??= []).push({ value, count });
  for (const list of Object.values(out)) list.sort((a, b) => b.count - a.count || compareFacetValues(a.value, b.value));
  return out;
}

const toResult = (row: Raw): EngineResult => ({
  total: row.total,
  hits: row.hits.map((h) => ({ doc: rowToDoc(h), score: Number(h.score) })),
  facets: facetCounts(row.facets),
  cutters: row.cutters.map(rowToDoc),
});

// Statements by everything but the vendor, built with a stand-in vendor that each search replaces with its own.
const VENDOR = "\u0000vendor";
const recentStatements = new LruCache<string, NativeStatement>(500);
// Searches (vendor, text, filters and page) whose first step matched nothing when last run: typeahead and popular
// queries repeat, so the next one runs every step in one statement at once (exact even if the first step matches by now).
const relaxedLately = new LruCache<string, true>(5000);

/**
 * What a search runs, as `$n` text:
 * - `"first"`: the first step's own search statement (the statement the benchmark runs bare);
 * - `"relaxed"`: the steps after it, answering the first of them that matches anything;
 * - `"every"`: every step, answering the first that matches anything (for searches that relaxed lately).
 * Built once per text, filters and page (`shapeKey`) with a stand-in vendor that each search replaces with its own.
 */
function statementOf(what: "first" | "relaxed" | "every", queries: readonly EngineQuery[], shapeKey?: string): NativeStatement {
  const vendorId = queries[0].vendorId;
  const build = (qs: readonly EngineQuery[]) => {
    const { sql, bindings } = what === "first" ? buildSearchSql(qs[0]) : buildFirstMatchingStepSql(what === "every" ? qs : qs.slice(1));
    const native = numberPlaceholders(sql, bindings);
    if (!native) throw new Error("The search statement has text only knex can number.");
    return native;
  };
  if (queries.some((q) => q.vendorId !== vendorId)) return build(queries);
  const key = `${what}:${shapeKey !== undefined ? `k${shapeKey}` : `q${JSON.stringify(queries.map(({ vendorId: _, ...rest }) => rest))}`}`;
  let cached = recentStatements.get(key);
  if (!cached) recentStatements.set(key, (cached = build(queries.map((q) => ({ ...q, vendorId: VENDOR })))));
  return { text: cached.text, values: cached.values.map((v) => (v === VENDOR ? vendorId : v)) };
}

/**
 * The default engine: the search_documents table (weighted tsvector, pg_trgm, unaccent) in the app's own database.
 * Writes go to `knex`; searches to the connection `reads` picks (the read replica when there is one).
 */
export function createPostgresEngine(knex: Knex, reads: () => Promise<Knex> = async () => knex): SearchEngine {
  return {
    name: "postgres",
    // The migration declares the settings (weights, trigram indexes); nothing to apply at run time.
    configure: async () => {},
    upsert: (vendorId, docs) => upsertRows(knex, vendorId, docs),
    remove: (vendorId, docIds) => removeRows(knex, vendorId, docIds),
    replaceVendor: (vendorId, docs) => replaceVendorRows(knex, vendorId, docs),
    async search(query: EngineQuery): Promise<EngineResult> {
      const { sql, bindings } = buildSearchSql(query);
      const [row] = await preparedQuery<Raw>(await reads(), sql, bindings);
      return toResult(row);
    },
    // Most searches match at their first step and pay for that step's own statement alone; when it matches nothing,
    // the later steps run in a second statement, and the same search next time runs every step in one.
    async searchSteps(queries: readonly EngineQuery[], shapeKey?: string) {
      const reader = await reads();
      const seen = shapeKey !== undefined && queries.length > 1 ? `${queries[0].vendorId}\u0000${shapeKey}` : undefined;
      if (seen !== undefined && relaxedLately.get(seen)) {
        const [row] = await runNative<Raw & { step: number }>(reader, statementOf("every", queries, shapeKey));
        if (row.step === 0) relaxedLately.delete(seen);
        return { step: row.step, result: toResult(row), roundTrips: 1 };
      }
      const [first] = await runNative<Raw>(reader, statementOf("first", queries, shapeKey));
      if (first.total > 0 || queries.length === 1) return { step: 0, result: toResult(first), roundTrips: 1 };
      if (seen !== undefined) relaxedLately.set(seen, true);
      const [row] = await runNative<Raw & { step: number }>(reader, statementOf("relaxed", queries, shapeKey));
      return { step: row.step + 1, result: toResult(row), roundTrips: 2 };
    },
  };
}
