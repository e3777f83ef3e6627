import "server-only";

import type PgBoss from "pg-boss";

import { backoffSeconds } from "./backoff";
import { getBoss, jobWriter } from "./boss";
import { DEFAULT_JOB_OPTIONS, ensureQueue } from "./enqueue";
import { JOB_CONCURRENCY, JOB_HANDLERS, JOB_RETRY_SCHEDULES, JOB_SCHEDULES, type JobHandler } from "./handlers";

const globalForWorker = globalThis as unknown as { swarfbookWorker?: Promise<void> };

const pollingIntervalSeconds = Math.max(0.5, Number(process.env.JOBS_POLL_SECONDS ?? 1));
const batchSize = Math.max(1, Number(process.env.JOBS_BATCH_SIZE ?? 10));
const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/**
 * Recording a job's result must outlast a database restart: a mail that was sent but not marked done would
 * be sent again when its job expires. So the record is retried (capped backoff, about two minutes in all).
 */
async function record(what: () => Promise<unknown>): Promise<void> {
  for (let attempt = 0; ; attempt++) {
    try {
      await what();
      return;
    } catch (error) {
      if (attempt >= 12) throw error;
      await sleep(backoffSeconds(attempt, { baseSeconds: 0.25, capSeconds: 15 }) * 1000);
    }
  }
}

// pg-boss waits retry_delay seconds after a failure; setting it per attempt gives a capped exponential backoff.
async function setNextDelay(name: string, id: string, seconds: number): Promise<void> {
  await jobWriter()
    .getDb()
    .executeSql("update pgboss.job set retry_delay = $1 where name = $2 and id = $3", [Math.max(1, Math.round(seconds)), name, id]);
}

/**
 * Each job of a batch is completed or failed on its own: pg-boss would otherwise fail the whole batch when one
 * job throws, and retry (resend) the ones that had already succeeded. Up to `lanes` jobs run at once.
 */
function runBatch(boss: PgBoss, name: string, handler: JobHandler, lanes: number, schedule?: { baseSeconds: number; capSeconds: number }) {
  async function runOne(job: PgBoss.JobWithMetadata) {
    try {
      await handler(job.data, { id: job.id, retryCount: job.retryCount });
    } catch (error) {
      const message = error instanceof Error ? error.message : String(error);
      console.error(`[jobs] ${name} ${job.id} failed (attempt ${job.retryCount + 1}): ${message}`);
      await record(async () => {
        if (schedule) await setNextDelay(name, job.id, backoffSeconds(job.retryCount, schedule));
        await boss.fail(name, job.id, { message });
      });
      return;
    }
    await record(() => boss.complete(name, job.id));
  }
  return async (jobs: PgBoss.JobWithMetadata[]) => {
    let next = 0;
    await Promise.all(
      Array.from({ length: Math.min(lanes, jobs.length) }, async () => {
        while (next < jobs.length) await runOne(jobs[next++]);
      }),
    );
    // A full batch means a backlog (after an outage, or a batch alert): fetch again at once instead of waiting out
    // the polling interval, so a backlog drains as fast as the handlers go.
    const workerId = workerIds.get(name);
    if (jobs.length >= batchSize && workerId) boss.notifyWorker(workerId);
  };
}

const workerIds = new Map<string, string>();

const registered = new Set<string>();

async function registerWorkers(): Promise<void> {
  const boss = await getBoss();
  for (const [name, handler] of Object.entries(JOB_HANDLERS)) {
    if (registered.has(name)) continue;
    await ensureQueue(name);
    const workerId = await boss.work(
      name,
      { pollingIntervalSeconds, batchSize, includeMetadata: true },
      runBatch(boss, name, handler, JOB_CONCURRENCY[name] ?? 1, JOB_RETRY_SCHEDULES[name]?.()),
    );
    workerIds.set(name, workerId);
    registered.add(name);
  }
  for (const [name, cron] of Object.entries(JOB_SCHEDULES)) await boss.schedule(name, cron, {}, { ...DEFAULT_JOB_OPTIONS, tz: "UTC" });
}

/**
 * Start handling every queue in this process (the web server does it unless JOBS_WORKER=off). A queue that
 * cannot start (the database is down at boot) is tried again with capped backoff until it can: no restart needed.
 */
export function startWorker(): Promise<void> {
  globalForWorker.swarfbookWorker ??= (async () => {
    for (let round = 0; ; round++) {
      try {
        await registerWorkers();
        return;
      } catch (error) {
        console.error("[jobs] worker could not start yet; trying again", error instanceof Error ? error.message : error);
        await sleep(backoffSeconds(round, { baseSeconds: 1, capSeconds: 30 }) * 1000);
      }
    }
  })();
  return globalForWorker.swarfbookWorker;
}
