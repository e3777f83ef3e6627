import "server-only";

import pg from "pg";
import PgBoss from "pg-boss";

import { directDatabaseUrl } from "@/lib/db/config";

import { backoffSeconds } from "./backoff";

export type QueueState = { state: "idle" | "starting" | "ready" | "failing"; attempts: number; lastError: string | null; since: string };

type Slot = { pool?: pg.Pool; writer?: PgBoss; boss?: PgBoss; starting?: Promise<PgBoss>; status: QueueState };
const globalForBoss = globalThis as unknown as { swarfbookBoss?: Slot };
const slot: Slot = (globalForBoss.swarfbookBoss ??= {
  status: { state: "idle", attempts: 0, lastError: null, since: new Date().toISOString() },
});

function setStatus(state: QueueState["state"], patch: Partial<QueueState> = {}) {
  slot.status = { ...slot.status, state, since: new Date().toISOString(), ...patch };
}

// The queue's own small pool, directly on the primary (never through PgBouncer: pg-boss needs session
// features); pg's pool reconnects by itself after the database comes back.
function pool(): pg.Pool {
  if (!slot.pool) {
    slot.pool = new pg.Pool({ connectionString: directDatabaseUrl(), max: 4, connectionTimeoutMillis: 5_000 });
    slot.pool.on("error", (error) => console.error("[jobs] idle connection lost", error.message));
  }
  return slot.pool;
}

const executor = () => ({ executeSql: (text: string, values?: unknown[]) => pool().query(text, values) });

/** A pg-boss that is never started: it only builds job rows, which the caller's transaction inserts. */
export function jobWriter(): PgBoss {
  slot.writer ??= new PgBoss({ db: executor() });
  return slot.writer;
}

export const queueState = (): QueueState => slot.status;

const START_ATTEMPTS = Number(process.env.JOBS_START_ATTEMPTS ?? 6);

async function startOnce(): Promise<PgBoss> {
  // A pg-boss whose start failed stays "starting" forever, so every attempt gets a fresh one.
  const boss = new PgBoss({ db: executor(), archiveCompletedAfterSeconds: 3 * 86_400 });
  boss.on("error", (error: unknown) => console.error("[jobs]", error));
  await boss.start();
  return boss;
}

async function startWithRetries(): Promise<PgBoss> {
  for (let attempt = 1; ; attempt++) {
    setStatus("starting", { attempts: slot.status.attempts + 1 });
    try {
      const boss = await startOnce();
      slot.boss = boss;
      setStatus("ready", { lastError: null });
      return boss;
    } catch (error) {
      setStatus("failing", { lastError: error instanceof Error ? error.message : String(error) });
      console.error(`[jobs] queue start failed (attempt ${attempt})`, slot.status.lastError);
      if (attempt >= START_ATTEMPTS) throw error;
      await new Promise((resolve) => setTimeout(resolve, backoffSeconds(attempt - 1, { baseSeconds: 0.5, capSeconds: 30 }) * 1000));
    }
  }
}

/**
 * The started pg-boss of this process. A start retries with capped backoff; when it gives up, the
 * failure is not remembered: the next call starts again.
 */
export function getBoss(): Promise<PgBoss> {
  if (slot.boss) return Promise.resolve(slot.boss);
  slot.starting ??= startWithRetries().finally(() => {
    slot.starting = undefined;
  });
  return slot.starting;
}

/** For tests and shutdown: stop the started instance; the next getBoss() starts a new one. */
export async function stopBoss(): Promise<void> {
  const boss = slot.boss;
  slot.boss = undefined;
  setStatus("idle");
  if (boss) await boss.stop({ graceful: false, wait: true });
}
