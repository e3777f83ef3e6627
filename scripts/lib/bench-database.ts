// Throwaway database for the benchmark scripts: created in the local cluster (never the dev database),
// migrated, handed to the benchmark and always dropped at the end.
import { randomBytes } from "node:crypto";
import path from "node:path";
import knexFactory, { type Knex } from "knex";

const DEFAULT_ADMIN_URL = "postgres://postgres@127.0.0.1:54329/postgres";

function assertLocal(url: string) {
  if (!["127.0.0.1", "localhost", "::1", "[::1]"].includes(new URL(url).hostname))
    throw new Error("The benchmark only runs against a local cluster.");
}

export type BenchDatabaseOptions = {
  /** Start of the database's name, e.g. `swarfbook_bench`; the process id and a random suffix follow. */
  prefix: string;
  /** Most connections of the benchmark's pool. */
  poolMax: number;
  /** Cluster to create the database in; BENCH_ADMIN_URL, else the local dev cluster. */
  adminUrl?: string;
};

/** Runs `run` with the URL of, and a knex pool on, a freshly migrated database that is dropped afterwards, whatever happens. */
export async function withBenchDatabase<T>(options: BenchDatabaseOptions, run: (url: string, knex: Knex) => Promise<T>): Promise<T> {
  const adminUrl = options.adminUrl ?? process.env.BENCH_ADMIN_URL ?? DEFAULT_ADMIN_URL;
  assertLocal(adminUrl);
  const name = `${options.prefix}_${process.pid}_${randomBytes(3).toString("hex")}`;
  const admin = knexFactory({ client: "pg", connection: adminUrl, pool: { min: 0, max: 1 } });
  await admin.raw(`create database ${name} template template1`);
  const url = new URL(adminUrl);
  url.pathname = `/${name}`;
  const knex: Knex = knexFactory({
    client: "pg",
    connection: url.toString(),
    pool: { min: 0, max: options.poolMax },
    migrations: { directory: path.join(import.meta.dirname, "../../migrations"), extension: "ts", loadExtensions: [".ts"] },
  });
  try {
    console.log(`database ${name}: migrating`);
    await knex.migrate.latest();
    return await run(url.toString(), knex);
  } finally {
    await knex.destroy();
    await admin.raw(`drop database if exists ${name} with (force)`);
    await admin.destroy();
    console.log(`dropped ${name}`);
  }
}
