import "server-only";

import { backoffSeconds } from "./backoff";
import { getBoss, jobWriter } from "./boss";
import { DEFAULT_JOB_OPTIONS, ensureQueue } from "./enqueue";
import { JOB_HANDLERS, JOB_RETRY_SCHEDULES, JOB_SCHEDULES } from "./handlers";

const globalForWorker = globalThis as unknown as { swarfbookWorker?: Promise<void> };

const pollingIntervalSeconds = Math.max(0.5, Number(process.env.JOBS_POLL_SECONDS ?? 1));

// pg-boss waits retry_delay seconds after a failure; setting it per attempt gives a capped exponential backoff.
async function setNextDelay(name: string, id: string, seconds: number): Promise<void> {
  await jobWriter()
    .getDb()
    .executeSql("update pgboss.job set retry_delay = $1 where name = $2 and id = $3", [Math.max(1, Math.round(seconds)), name, id]);
}

const registered = new Set<string>();

async function registerWorkers(): Promise<void> {
  const boss = await getBoss();
  for (const [name, handler] of Object.entries(JOB_HANDLERS)) {
    if (registered.has(name)) continue;
    await ensureQueue(name);
    const schedule = JOB_RETRY_SCHEDULES[name]?.();
    await boss.work(name, { pollingIntervalSeconds, batchSize: 1, includeMetadata: true }, async (jobs) => {
      for (const job of jobs) {
        try {
          await handler(job.data, { id: job.id, retryCount: job.retryCount });
        } catch (error) {
          if (schedule) await setNextDelay(name, job.id, backoffSeconds(job.retryCount, schedule)).catch(() => undefined);
          throw error;
        }
      }
    });
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
        await new Promise((resolve) => setTimeout(resolve, backoffSeconds(round, { baseSeconds: 1, capSeconds: 30 }) * 1000));
      }
    }
  })();
  return globalForWorker.swarfbookWorker;
}
