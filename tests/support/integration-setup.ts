import { inject } from "vitest";

// Runs before each integration test file imports the app's modules, so lib/db/knex.ts sees this database.
process.env.DATABASE_URL = inject("integrationDatabaseUrl");
process.env.JOBS_WORKER = "off";

declare module "vitest" {
  export interface ProvidedContext {
    integrationDatabaseUrl: string;
  }
}
