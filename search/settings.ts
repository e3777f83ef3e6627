import { oneWaySynonyms, synonymGroups } from "@/search/vocabulary/synonyms";

/** Fields of the index document that the settings name (the document module defines their values). */
export type IndexField =
  | "title"
  | "cutterSku"
  | "cutterName"
  | "materialNames"
  | "operations"
  | "tags"
  | "body"
  | "vendorId"
  | "materialKey"
  | "materialGroup"
  | "diameterMm"
  | "flutes"
  | "cornerForm"
  | "machineClass"
  | "publishedAt";

/**
 * Engine-independent index settings, declared once; each engine maps them to its own form
 * (tsvector weights and pg_trgm for PostgreSQL, index settings for Meilisearch).
 */
export const searchSettings = {
  /** Most important first. `materialNames` holds the material's name and its vocabulary synonyms. */
  searchableAttributes: ["title", "cutterSku", "cutterName", "materialNames", "operations", "tags", "body"],
  filterableAttributes: [
    "vendorId",
    "materialKey",
    "materialGroup",
    "operations",
    "diameterMm",
    "flutes",
    "cornerForm",
    "machineClass",
    "cutterSku",
  ],
  sortableAttributes: ["publishedAt", "diameterMm", "title"],
  /** Facet counts shown beside the results. */
  facets: ["materialGroup", "materialKey", "operations", "diameterMm", "flutes", "cornerForm", "machineClass"],
  /** Multi-way groups: any word of a group finds the others. Derived from search/vocabulary. */
  synonyms: synonymGroups,
  /** One-way: the key (`oak`) also finds the listed words (`hardwood`), not the reverse. */
  oneWaySynonyms,
  typoTolerance: {
    /** Words shorter than this must match exactly; from this length one typo is allowed. */
    minWordSizeForOneTypo: 5,
    /** From this length two typos are allowed (`alumnium` is one typo from `aluminium`). */
    minWordSizeForTwoTypos: 9,
    /** SKUs and numbers are exact: a typo there is another cutter. */
    disableOnAttributes: ["cutterSku"],
    disableOnNumbers: true,
  },
  /**
   * A parsed diameter matches a document diameter within this, since catalogues round
   * (1/8 in is listed as 3.175 or 3.18 mm).
   */
  diameterToleranceMm: 0.01,
} as const satisfies {
  searchableAttributes: readonly IndexField[];
  filterableAttributes: readonly IndexField[];
  sortableAttributes: readonly IndexField[];
  facets: readonly IndexField[];
  typoTolerance: { disableOnAttributes: readonly IndexField[] } & Record<string, unknown>;
} & Record<string, unknown>;

export type SearchSettings = typeof searchSettings;
