import "server-only";

import { db } from "@/lib/db/knex";
import { readDb } from "@/lib/db/read-db";

import type { SearchEngine } from "./engine-types";
import { createMeilisearchEngine } from "./meilisearch/meilisearch-engine";
import { createPostgresEngine } from "./postgres/postgres-engine";

// Per module, not on globalThis: a hot reload then picks up a changed engine (the pool is global anyway).
let chosen: SearchEngine | undefined;

/** Meilisearch when MEILISEARCH_HOST is set, else the PostgreSQL engine in the app's database. */
export function getSearchEngine(): SearchEngine {
  if (chosen) return chosen;
  const host = process.env.MEILISEARCH_HOST?.trim();
  const engine = host
    ? createMeilisearchEngine({
        host,
        apiKey: process.env.MEILISEARCH_API_KEY || undefined,
        indexUid: process.env.MEILISEARCH_INDEX || undefined,
      })
    : createPostgresEngine(db, readDb);
  chosen = engine;
  return engine;
}
