import "server-only";

import knexFactory, { type Knex } from "knex";
import pg from "pg";

import { knexConfig } from "./config";
import { db } from "./knex";

export type ReplicaState = { configured: boolean; usable: boolean; lagSeconds: number | null; checkedAt: string | null; error?: string };

const CHECK_EVERY_MS = 1500;

export function replicaUrl(): string | null {
  return process.env.DATABASE_REPLICA_URL?.trim() || null;
}

/** Reads fall back to the primary when the replica is further behind than this. */
export function maxLagSeconds(): number {
  const value = Number(process.env.DATABASE_REPLICA_MAX_LAG_SECONDS ?? "10");
  return Number.isFinite(value) && value >= 0 ? value : 10;
}

// A streaming standby that has replayed all it received is caught up, however old its last transaction.
// The receiver's status is visible only with pg_read_all_stats (the scale shape grants it to the app role, so a
// standby cut off from its primary counts as lagging); without it, receiving WAL at all stands in for streaming.
const LAG_SQL = `
  select pg_is_in_recovery() as standby,
    coalesce((select status = 'streaming' from pg_stat_wal_receiver limit 1), pg_last_wal_receive_lsn() is not null) as streaming,
    coalesce(pg_last_wal_receive_lsn() = pg_last_wal_replay_lsn(), false) as caught_up,
    extract(epoch from now() - pg_last_xact_replay_timestamp())::float8 as since_replay`;

type LagRow = { standby: boolean; streaming: boolean; caught_up: boolean; since_replay: number | null };

function lagOf(row: LagRow): number | null {
  if (!row.standby) return 0;
  if (row.streaming && row.caught_up) return 0;
  return row.since_replay === null ? null : Math.max(0, row.since_replay);
}

async function measure(url: string): Promise<ReplicaState> {
  const client = new pg.Client({ connectionString: url, connectionTimeoutMillis: 1000, query_timeout: 1000 });
  const checkedAt = new Date().toISOString();
  try {
    await client.connect();
    const { rows } = await client.query<LagRow>(LAG_SQL);
    const lagSeconds = rows[0] ? lagOf(rows[0]) : null;
    return { configured: true, usable: lagSeconds !== null && lagSeconds <= maxLagSeconds(), lagSeconds, checkedAt };
  } catch (error) {
    return { configured: true, usable: false, lagSeconds: null, checkedAt, error: error instanceof Error ? error.message : String(error) };
  } finally {
    await client.end().catch(() => undefined);
  }
}

type Cache = { url?: string; state: ReplicaState; at: number; pending?: Promise<ReplicaState>; pools: Map<string, Knex> };
const globalForReplica = globalThis as unknown as { swarfbookReplica?: Cache };
const cache: Cache = (globalForReplica.swarfbookReplica ??= {
  state: { configured: false, usable: false, lagSeconds: null, checkedAt: null },
  at: 0,
  pools: new Map(),
});

/** The replica's lag and whether reads may use it; measured at most every 1.5 s per process, never per query. */
export async function replicaState(): Promise<ReplicaState> {
  const url = replicaUrl();
  if (!url) return { configured: false, usable: false, lagSeconds: null, checkedAt: null };
  if (cache.url !== url) Object.assign(cache, { url, at: 0, pending: undefined });
  if (Date.now() - cache.at < CHECK_EVERY_MS) return cache.state;
  cache.pending ??= measure(url).then((state) => {
    if (cache.url !== url) return state;
    cache.state = state;
    cache.at = Date.now();
    cache.pending = undefined;
    return state;
  });
  return cache.pending;
}

function markDown(error: unknown): void {
  cache.state = { ...cache.state, usable: false, error: error instanceof Error ? error.message : String(error) };
  cache.at = Date.now();
}

const LOST = new Set(["57P01", "57P02", "57P03", "08000", "08001", "08003", "08006", "ECONNREFUSED", "ECONNRESET", "EPIPE", "ETIMEDOUT"]);
function connectionLost(error: unknown): boolean {
  if (!error || typeof error !== "object") return false;
  const code = "code" in error ? String(error.code) : "";
  const message = error instanceof Error ? error.message : "";
  return LOST.has(code) || /Connection terminated|not queryable|Timeout acquiring a connection/i.test(message);
}

/**
 * A read on the replica that loses its connection (the replica stopped or restarted between two checks)
 * runs again on the primary instead of failing the page: reads are safe to repeat.
 */
function withPrimaryFallback(replica: Knex, primary: Knex): Knex {
  const client = replica.client;
  const borrowed = new WeakSet<object>();
  const acquire = client.acquireConnection.bind(client);
  const release = client.releaseConnection.bind(client);
  const query = client.query.bind(client);
  client.acquireConnection = async () => {
    try {
      return await acquire();
    } catch (error) {
      markDown(error);
      const connection = await primary.client.acquireConnection();
      borrowed.add(connection);
      return connection;
    }
  };
  client.releaseConnection = (connection: object) =>
    borrowed.delete(connection) ? primary.client.releaseConnection(connection) : release(connection);
  client.query = async (connection: object, statement: unknown) => {
    // The query step rewrites placeholders in place; keep the original for a second run.
    const original = statement && typeof statement === "object" ? { ...statement } : statement;
    try {
      return await query(connection, statement);
    } catch (error) {
      if (borrowed.has(connection) || !connectionLost(error)) throw error;
      markDown(error);
      const fallback = await primary.client.acquireConnection();
      try {
        return await primary.client.query(fallback, original);
      } finally {
        await primary.client.releaseConnection(fallback);
      }
    }
  };
  return replica;
}

/** The replica's pool (created on first use), or null when DATABASE_REPLICA_URL is not set. */
export function replicaDb(): Knex | null {
  const url = replicaUrl();
  if (!url) return null;
  let pool = cache.pools.get(url);
  if (!pool) {
    pool = withPrimaryFallback(
      knexFactory({
        ...knexConfig(url),
        connection: { connectionString: url, connectionTimeoutMillis: 1000 },
        acquireConnectionTimeout: 2000,
      }),
      db,
    );
    cache.pools.set(url, pool);
  }
  return pool;
}
