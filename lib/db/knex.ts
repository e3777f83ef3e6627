import "server-only";

import knexFactory, { type Knex } from "knex";

import { knexConfig } from "./config";
import { DATABASE_UNAVAILABLE_DIGEST, isDatabaseUnavailable } from "./unavailable";

// One pool per server process; the global survives hot reloads in development.
const globalForDb = globalThis as unknown as { swarfbookDb?: Knex };

function create(): Knex {
  const knex = knexFactory(knexConfig());
  // Next keeps an error's digest when it hides the message: pages' error boundaries then recognise a restart.
  knex.on("query-error", (error: unknown) => {
    if (isDatabaseUnavailable(error) && error && typeof error === "object") Object.assign(error, { digest: DATABASE_UNAVAILABLE_DIGEST });
  });
  return knex;
}

export const db: Knex = globalForDb.swarfbookDb ?? create();
globalForDb.swarfbookDb = db;
