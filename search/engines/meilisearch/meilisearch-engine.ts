import { Meilisearch, type Task } from "meilisearch";

import { searchDocumentSchema, type SearchDocument } from "@/search/document/document-schema";
import { searchSettings } from "@/search/settings";

import type { EngineQuery, EngineResult, FacetCounts, FacetName, SearchEngine } from "../engine-types";
import { compareFacetValues } from "../facet-order";
import { buildMeiliFilter, quote, vendorFilter } from "./meili-filter";
import { meiliSettings } from "./meili-settings";

export type MeiliOptions = { host: string; apiKey?: string; indexUid?: string; timeoutMs?: number };

const RETRIEVE = searchDocumentSchema.keyof().options.filter((k) => k !== "body");

function assertSucceeded(task: Task, what: string) {
  if (task.status !== "succeeded") throw new Error(`Meilisearch ${what} ${task.status}: ${task.error?.message ?? "no detail"}`);
}

function facetCounts(distribution: Record<string, Record<string, number>> | undefined): FacetCounts {
  const out: FacetCounts = {};
  for (const [facet, values] of Object.entries(distribution ?? {})) {
    out[facet as FacetName] = Object.entries(values)
      .map(([value, count]) => ({ value, count }))
      .sort((a, b) => b.count - a.count || compareFacetValues(a.value, b.value));
  }
  return out;
}

const toDoc = (hit: Record<string, unknown>): SearchDocument => searchDocumentSchema.parse({ ...hit, body: "" });

/**
 * Meilisearch through the official client. One shared index for all vendors; every search and
 * delete carries the vendorId filter (vendorFilter), and documents are written with their vendor's id.
 */
export function createMeilisearchEngine({ host, apiKey, indexUid = "swarfbook_search", timeoutMs = 10_000 }: MeiliOptions): SearchEngine {
  const client = new Meilisearch({ host, apiKey });
  const index = client.index<SearchDocument>(indexUid);
  const wait = { timeout: timeoutMs, interval: 50 };
  let configured: Promise<void> | null = null;

  const configure = () =>
    (configured ??= (async () => {
      const created = await client.createIndex(indexUid, { primaryKey: "id" }).waitTask(wait);
      if (created.status !== "succeeded" && created.error?.code !== "index_already_exists") assertSucceeded(created, "index creation");
      assertSucceeded(await index.updateSettings(meiliSettings()).waitTask(wait), "settings update");
    })().catch((error: unknown) => {
      configured = null;
      throw error;
    }));

  const add = async (vendorId: string, docs: readonly SearchDocument[]) => {
    if (docs.length === 0) return;
    const owned = docs.map((d) => ({ ...d, vendorId }));
    assertSucceeded(await index.addDocuments(owned, { primaryKey: "id" }).waitTask(wait), "document update");
  };
  const deleteWhere = async (filter: string) =>
    assertSucceeded(await index.deleteDocuments({ filter }).waitTask(wait), "document deletion");

  return {
    name: "meilisearch",
    configure,
    async upsert(vendorId, docs) {
      await configure();
      await add(vendorId, docs);
    },
    async remove(vendorId, docIds) {
      if (docIds.length === 0) return;
      await configure();
      await deleteWhere(`${vendorFilter(vendorId)} AND id IN [${docIds.map(quote).join(", ")}]`);
    },
    async replaceVendor(vendorId, docs) {
      await configure();
      await deleteWhere(vendorFilter(vendorId));
      await add(vendorId, docs);
    },
    async search(q: EngineQuery): Promise<EngineResult> {
      const text = [...q.words].join(" ");
      const skus = q.boosts.skus ?? [];
      const { results } = await client.multiSearch({
        queries: [
          {
            indexUid,
            q: text,
            filter: buildMeiliFilter(q.vendorId, "sheet", q.filters),
            facets: [...searchSettings.facets],
            page: q.page,
            hitsPerPage: q.perPage,
            attributesToRetrieve: RETRIEVE,
            showRankingScore: true,
          },
          ...(skus.length
            ? [{ indexUid, q: "", filter: buildMeiliFilter(q.vendorId, "cutter", { skus }), limit: 5, attributesToRetrieve: RETRIEVE }]
            : []),
        ],
      });
      const [sheets, cutters] = results;
      return {
        total: sheets.totalHits ?? sheets.estimatedTotalHits ?? sheets.hits.length,
        hits: sheets.hits.map((h) => ({ doc: toDoc(h), score: Number(h._rankingScore ?? 0) })),
        facets: facetCounts(sheets.facetDistribution),
        cutters: (cutters?.hits ?? []).map(toDoc),
      };
    },
  };
}
