import "server-only";

import { createHash } from "node:crypto";
import type { Knex } from "knex";
import type PgBoss from "pg-boss";

import { getBoss, jobWriter } from "./boss";
import { inTransaction, knexExecutor } from "./knex-executor";

// Retries with backoff: a job outlives a search engine that is down for a while. Mail has its own, longer schedule.
export const DEFAULT_JOB_OPTIONS = {
  retryLimit: 12,
  retryDelay: Math.max(1, Number(process.env.JOBS_RETRY_DELAY_SECONDS ?? 5)),
  retryBackoff: true,
  expireInSeconds: 300,
};

export type EnqueueOptions = Omit<PgBoss.SendOptions, "db" | "id"> & {
  /** The job's identity for its purpose (say "reply:<message>:<recipient>"): the same key is queued once. */
  key?: string;
};

const ready = new Set<string>();
let creating: Promise<unknown> = Promise.resolve();

// pg-boss makes a table partition per queue; two creations at once can deadlock, so this process makes
// one at a time, and a deadlock with another process is retried.
async function createQueueOnce(name: string, options: Omit<PgBoss.Queue, "name">): Promise<void> {
  for (let attempt = 0; ; attempt++) {
    try {
      if (
        await jobWriter()
          .getQueue(name)
          .catch(() => null)
      )
        return;
      // No queue, or no pg-boss schema yet: a started pg-boss installs the schema, then the queue is made.
      const boss = await getBoss();
      await boss.createQueue(name, { name, ...options });
      return;
    } catch (error) {
      if ((error as { code?: string }).code !== "40P01" || attempt >= 3) throw error;
    }
  }
}

/** Queues must exist before a job row can be inserted (pg-boss joins on them); created once per process. */
export async function ensureQueue(name: string, options: Omit<PgBoss.Queue, "name"> = {}): Promise<void> {
  if (ready.has(name)) return;
  const turn = creating.then(() => createQueueOnce(name, options));
  creating = turn.catch(() => undefined);
  await turn;
  ready.add(name);
}

/** A UUID derived from the queue and key, so a repeated send of one key meets the primary key and is dropped. */
export function jobIdFor(name: string, key: string): string {
  const hex = createHash("sha256").update(`${name}\u0000${key}`).digest("hex");
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-5${hex.slice(13, 16)}-${((parseInt(hex[16], 16) & 0x3) | 0x8).toString(16)}${hex.slice(17, 20)}-${hex.slice(20, 32)}`;
}

/**
 * Queue a job inside the caller's transaction: it commits with the write that implies it, or not at all.
 * Returns the job id, or null when a job with the same key was already queued.
 */
export async function enqueue(
  trx: Knex | Knex.Transaction,
  name: string,
  data: object,
  options: EnqueueOptions = {},
): Promise<string | null> {
  await ensureQueue(name);
  const { key, ...rest } = options;
  return inTransaction(trx, (t) =>
    jobWriter().send(name, data, {
      ...DEFAULT_JOB_OPTIONS,
      ...rest,
      ...(key ? { id: jobIdFor(name, key), singletonKey: key } : {}),
      db: knexExecutor(t),
    }),
  );
}
