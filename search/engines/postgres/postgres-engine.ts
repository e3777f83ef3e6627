import type { Knex } from "knex";

import { LruCache } from "@/lib/mdx/lru-cache";

import type { EngineQuery, EngineResult, FacetCounts, FacetName, SearchEngine } from "../engine-types";
import { compareFacetValues } from "../facet-order";
import { rowToDoc } from "./pg-columns";
import { buildFirstMatchingStepSql, buildKnownStepSql, buildSearchSql } from "./pg-search-sql";
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

// Statements by everything but the vendor (and the index version a "known" statement expects), built with stand-ins
// that each search replaces with its own.
const VENDOR = "\u0000vendor";
const VERSION = "\u0000version";
const recentStatements = new LruCache<string, NativeStatement>(500);

/** What a search runs: its first step's own statement, every step at once, or a step known to answer first. */
type Statement = { what: "first" } | { what: "every" } | { what: "known"; step: number; version: string };

/**
 * A statement as `$n` text:
 * - `first`: the first step's own search statement (the statement the benchmark runs bare);
 * - `every`: every step, answering the first that matches anything and the vendor's search index version;
 * - `known`: step `step`'s own statement, answered while the vendor's index is still at `version`.
 * Built once per text, filters and page (`shapeKey`) and kind.
 */
function statementOf(s: Statement, queries: readonly EngineQuery[], shapeKey?: string): NativeStatement {
  const vendorId = queries[0].vendorId;
  const version = s.what === "known" ? s.version : "";
  const build = (qs: readonly EngineQuery[], v: string) => {
    const { sql, bindings } =
      s.what === "first" ? buildSearchSql(qs[0]) : s.what === "every" ? buildFirstMatchingStepSql(qs) : buildKnownStepSql(qs[s.step], v);
    const native = numberPlaceholders(sql, bindings);
    if (!native) throw new Error("The search statement has text only knex can number.");
    return native;
  };
  if (queries.some((q) => q.vendorId !== vendorId)) return build(queries, version);
  const kind = s.what === "known" ? `known${s.step}` : s.what;
  const key = `${kind}:${shapeKey !== undefined ? `k${shapeKey}` : `q${JSON.stringify(queries.map(({ vendorId: _, ...rest }) => rest))}`}`;
  let cached = recentStatements.get(key);
  if (!cached) {
    const standIns = queries.map((q) => ({ ...q, vendorId: VENDOR }));
    recentStatements.set(key, (cached = build(standIns, VERSION)));
  }
  return { text: cached.text, values: cached.values.map((v) => (v === VENDOR ? vendorId : v === VERSION ? version : v)) };
}

// Searches (vendor, text, filters and page) whose first step matched nothing when last run, with the step that
// answered and the vendor's search index version then: while the index stays at that version, the steps before
// the one that answered still match nothing, so that step's own statement answers exactly (typeahead and popular
// queries repeat).
const relaxedLately = new LruCache<string, { step: number; version: string }>(5000);

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
    // Most searches match at their first step and pay for that step's own statement alone. When it matches nothing,
    // every step runs in a second statement; the same search next time runs the step that answered, in one.
    async searchSteps(queries: readonly EngineQuery[], shapeKey?: string) {
      const reader = await reads();
      const seen = shapeKey !== undefined && queries.length > 1 ? `${queries[0].vendorId}\u0000${shapeKey}` : undefined;
      const known = seen !== undefined ? relaxedLately.get(seen) : undefined;
      if (known) {
        const [row] = await runNative<Raw & { version: string }>(reader, statementOf({ what: "known", ...known }, queries, shapeKey));
        if (row.version === known.version) return { step: known.step, result: toResult(row), roundTrips: 1 };
      } else {
        const [first] = await runNative<Raw>(reader, statementOf({ what: "first" }, queries, shapeKey));
        if (first.total > 0 || queries.length === 1) return { step: 0, result: toResult(first), roundTrips: 1 };
      }
      const [row] = await runNative<Raw & { step: number; version: string }>(reader, statementOf({ what: "every" }, queries, shapeKey));
      if (seen !== undefined && row.step > 0) relaxedLately.set(seen, { step: row.step, version: row.version });
      else if (seen !== undefined) relaxedLately.delete(seen);
      return { step: row.step, result: toResult(row), roundTrips: 2 };
    },
  };
}
