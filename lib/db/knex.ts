import "server-only";

import knexFactory, { type Knex } from "knex";

import { knexConfig } from "./config";

// One pool per server process; the global survives hot reloads in development.
const globalForDb = globalThis as unknown as { swarfbookDb?: Knex };

export const db: Knex = globalForDb.swarfbookDb ?? knexFactory(knexConfig());
globalForDb.swarfbookDb = db;
