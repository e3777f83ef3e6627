import { randomBytes } from "node:crypto";
import { readdirSync } from "node:fs";
import path from "node:path";
import knexFactory, { type Knex } from "knex";
import { afterAll, beforeAll } from "vitest";

import { assertLocalDatabase } from "./local-db-guard";

type Migration = { up: (knex: Knex) => Promise<void>; down: (knex: Knex) => Promise<void> };

const root = path.resolve(import.meta.dirname, "../..");
export const loadMigration = async (file: string): Promise<Migration> => import(path.join(root, "migrations", file));

/**
 * A database of its own, migrated up to (not including) `migration`, so a test can write rows in the old shape and
 * watch the migration carry them over. Dropped after the file's tests.
 */
export function migrationDatabase(migration: string): { knex: () => Knex } {
  const adminUrl = process.env.TEST_ADMIN_URL ?? "postgres://postgres@127.0.0.1:54329/postgres";
  const name = `swarfbook_mig_${process.pid}_${randomBytes(3).toString("hex")}`;
  let admin: Knex;
  let knex: Knex;
  beforeAll(async () => {
    assertLocalDatabase(adminUrl);
    admin = knexFactory({ client: "pg", connection: adminUrl, pool: { min: 0, max: 1 } });
    await admin.raw(`create database ${name} template template1`);
    const url = new URL(adminUrl);
    url.pathname = `/${name}`;
    knex = knexFactory({ client: "pg", connection: url.toString(), pool: { min: 0, max: 2 } });
    const files = readdirSync(path.join(root, "migrations"))
      .filter((f) => f.endsWith(".ts"))
      .sort();
    for (const file of files.slice(0, files.indexOf(migration))) await (await loadMigration(file)).up(knex);
  }, 120_000);
  afterAll(async () => {
    await knex?.destroy();
    await admin?.raw(`drop database if exists ${name} with (force)`);
    await admin?.destroy();
  });
  return { knex: () => knex };
}
