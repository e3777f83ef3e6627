import type { OperationKind } from "@/lib/machining/types";
import type { SearchDocument } from "@/search/document/document-schema";
import type { CornerForm, MaterialGroup } from "@/search/vocabulary/types";

/** Parsed parts an engine applies, as hard filters or as ranking boosts. */
export type QueryParts = {
  /** Any of these keys (already widened with materialKeysWithin). */
  materialKeys?: readonly string[];
  materialGroups?: readonly MaterialGroup[];
  /** Every one of these operations. */
  operations?: readonly OperationKind[];
  /** Within searchSettings.diameterToleranceMm. */
  diameterMm?: number;
  flutes?: number;
  cornerForms?: readonly CornerForm[];
  geometry?: readonly string[];
  machineClass?: string;
  /** Exact cutter SKUs, upper case (boosts only). */
  skus?: readonly string[];
};

export type FacetName = "materialGroup" | "materialKey" | "operations" | "diameterMm" | "flutes" | "cornerForm" | "machineClass";
export type FacetCounts = Partial<Record<FacetName, { value: string; count: number }[]>>;

export type EngineQuery = {
  vendorId: string;
  /** Free-text words, lower case, typos already corrected where the vocabulary knew better. */
  words: readonly string[];
  /** Other words for each free-text word (synonyms), matched like the word. */
  alternatives?: readonly string[];
  /** The last word as typed so far, matched as a prefix. */
  prefix?: string;
  filters: QueryParts;
  boosts: QueryParts;
  page: number;
  perPage: number;
};

export type EngineHit = { doc: SearchDocument; score: number };
export type EngineResult = { total: number; hits: EngineHit[]; facets: FacetCounts; cutters: SearchDocument[] };

/** What every search engine does; the settings come from search/settings.ts. */
export interface SearchEngine {
  readonly name: "postgres" | "meilisearch";
  /** Apply searchSettings to the engine (idempotent). */
  configure(): Promise<void>;
  /** Insert or replace documents of one vendor. */
  upsert(vendorId: string, docs: readonly SearchDocument[]): Promise<void>;
  /** Remove documents of one vendor by id; unknown ids are ignored. */
  remove(vendorId: string, docIds: readonly string[]): Promise<void>;
  /** Replace every document of a vendor (full reindex). */
  replaceVendor(vendorId: string, docs: readonly SearchDocument[]): Promise<void>;
  search(query: EngineQuery): Promise<EngineResult>;
  /**
   * Optional: the steps of a search (strictest first) in few round trips, answering the first step that
   * matched anything (else the last), its index and, when the engine counts them, the round trips taken.
   * Without it, runSearch calls `search` step by step.
   * `shapeKey`, when given, names everything about the queries but the vendor (the same key, the same queries).
   */
  searchSteps?(queries: readonly EngineQuery[], shapeKey?: string): Promise<{ step: number; result: EngineResult; roundTrips?: number }>;
}
