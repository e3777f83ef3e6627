import type { OperationKind } from "@/lib/machining/types";
import type { ChipKind, QueryChip } from "@/search/parse/types";

import type { FacetCounts } from "../engines/engine-types";
import type { Correction } from "./correct-typos";
import type { HighlightRange } from "./highlight";

export type SearchHit = {
  slug: string;
  version: number;
  title: string;
  summary: string;
  cutter: { sku: string; name: string; diameterMm: number; flutes: number; cornerForm: string };
  material: { name: string | null; key: string | null; group: string | null };
  machineClass: { slug: string; name: string } | null;
  operations: OperationKind[];
  publishedAt: string | null;
  highlights: { title: HighlightRange[]; summary: HighlightRange[]; cutter: HighlightRange[]; material: HighlightRange[] };
};

export type CutterHit = { sku: string; name: string; diameterMm: number; flutes: number };

export type SearchResponse = {
  query: string;
  page: number;
  perPage: number;
  total: number;
  hits: SearchHit[];
  facets: FacetCounts;
  cutters: CutterHit[];
  chips: QueryChip[];
  corrections: Correction[];
  /** Parts left out because nothing matched them all; empty when every part was applied. */
  relaxed: ChipKind[];
  /** Looser queries to offer when nothing (or only a relaxed set) matched. */
  suggestions: string[];
  /** A short reading of the query for the empty state. */
  description: string;
  engine: string;
};
