import "server-only";

import { getBoss } from "./boss";

const created = new Set<string>();

// Retries with backoff: a job outlives a mail server or search engine that is down for a while.
export const DEFAULT_JOB_OPTIONS = { retryLimit: 12, retryDelay: 5, retryBackoff: true, expireInSeconds: 300 };

const DEADLOCK = "40P01";

export async function ensureQueue(name: string): Promise<void> {
  if (created.has(name)) return;
  const boss = await getBoss();
  // Two processes starting together create the same queues (a row plus a partition each) in their own order,
  // and PostgreSQL may break the tie with a deadlock error: the loser tries again.
  for (let attempt = 1; ; attempt++) {
    try {
      await boss.createQueue(name);
      break;
    } catch (error) {
      const code = error && typeof error === "object" && "code" in error ? error.code : undefined;
      if (code !== DEADLOCK || attempt >= 5) throw error;
      await new Promise((resolve) => setTimeout(resolve, 50 + Math.random() * 200 * attempt));
    }
  }
  created.add(name);
}

export async function enqueue(name: string, data: object, options: { singletonKey?: string; startAfter?: number } = {}) {
  await ensureQueue(name);
  const boss = await getBoss();
  return boss.send(name, data, { ...DEFAULT_JOB_OPTIONS, ...options });
}
