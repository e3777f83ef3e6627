import type { Knex } from "knex";

import { compareFacetValues } from "../facet-order";
import type { EngineQuery, EngineResult, FacetCounts, FacetName, SearchEngine } from "../engine-types";
import { rowToDoc } from "./pg-columns";
import { buildSearchSql, buildSearchStepsSql } from "./pg-search-sql";
import { preparedQuery } from "./prepared-query";
import { removeRows, replaceVendorRows, upsertRows } from "./pg-write";

type Raw = { total: number; hits: Record<string, unknown>[]; facets: { facet: FacetName; value: string; count: number }[]; cutters: Record<string, unknown>[] };

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
    async searchSteps(queries: readonly EngineQuery[]) {
      const { sql, bindings } = buildSearchStepsSql(queries);
      const rows = await preparedQuery<Raw & { step: number }>(await reads(), sql, bindings);
      const row = rows.find((r) => r.total > 0) ?? rows.reduce((last, r) => (r.step > last.step ? r : last));
      return { step: row.step, result: toResult(row) };
    },
  };
}
