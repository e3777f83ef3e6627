import "server-only";

import { getBoss } from "./boss";
import { DEFAULT_JOB_OPTIONS, ensureQueue } from "./enqueue";
import { JOB_HANDLERS, JOB_SCHEDULES } from "./handlers";

let started = false;

/** Start handling every queue in this process (the web server does it unless JOBS_WORKER=off). */
export async function startWorker(): Promise<void> {
  if (started) return;
  started = true;
  const boss = await getBoss();
  for (const [name, handler] of Object.entries(JOB_HANDLERS)) {
    await ensureQueue(name);
    await boss.work(name, { pollingIntervalSeconds: 1, batchSize: 1 }, async (jobs) => {
      for (const job of jobs) await handler(job.data);
    });
  }
  for (const [name, cron] of Object.entries(JOB_SCHEDULES)) await boss.schedule(name, cron, {}, { ...DEFAULT_JOB_OPTIONS, tz: "UTC" });
}
