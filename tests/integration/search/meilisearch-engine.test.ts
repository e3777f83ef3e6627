import { describe, it } from "vitest";

import { createMeilisearchEngine } from "@/search/engines/meilisearch/meilisearch-engine";

import { defineEngineContract } from "./engine-contract";

// The Meilisearch server cannot be installed here; point MEILISEARCH_HOST at one to run the contract.
const host = process.env.MEILISEARCH_HOST;
if (host) {
  defineEngineContract("meilisearch", () =>
    createMeilisearchEngine({ host, apiKey: process.env.MEILISEARCH_API_KEY, indexUid: `contract_${Date.now()}` }),
  );
} else {
  describe("search engine contract: meilisearch", () => it.skip("needs MEILISEARCH_HOST", () => {}));
}
