import { execFileSync } from "node:child_process";
import { randomBytes } from "node:crypto";
import path from "node:path";
import knexFactory from "knex";
import type { TestProject } from "vitest/node";

import { assertLocalDatabase } from "./local-db-guard";

// Every integration run gets a fresh, migrated database in the local cluster and drops it after.
const adminUrl = process.env.TEST_ADMIN_URL ?? "postgres://postgres@127.0.0.1:54329/postgres";

export default async function setup(project: TestProject) {
  assertLocalDatabase(adminUrl);
  const name = `swarfbook_it_${process.pid}_${randomBytes(3).toString("hex")}`;
  const admin = knexFactory({ client: "pg", connection: adminUrl, pool: { min: 0, max: 1 } });
  await admin.raw(`create database ${name} template template1`);
  const url = new URL(adminUrl);
  url.pathname = `/${name}`;
  const dbUrl = url.toString();
  // TypeScript migrations need the tsx loader, which the vitest main process does not have.
  const root = path.resolve(import.meta.dirname, "../..");
  execFileSync(process.execPath, ["--import", "tsx", "node_modules/knex/bin/cli.js", "--knexfile", "knexfile.ts", "migrate:latest"], {
    cwd: root,
    env: { ...process.env, DATABASE_URL: dbUrl },
    stdio: "pipe",
  });
  // Given to the integration project only (tests/support/integration-setup.ts); the e2e project keeps its own database.
  project.provide("integrationDatabaseUrl", dbUrl);

  return async () => {
    await admin.raw(`drop database if exists ${name} with (force)`);
    await admin.destroy();
  };
}
