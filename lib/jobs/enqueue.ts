import "server-only";

import { getBoss } from "./boss";

const created = new Set<string>();

// Retries with backoff: a job outlives a mail server or search engine that is down for a while.
export const DEFAULT_JOB_OPTIONS = { retryLimit: 12, retryDelay: 5, retryBackoff: true, expireInSeconds: 300 };

export async function ensureQueue(name: string): Promise<void> {
  if (created.has(name)) return;
  const boss = await getBoss();
  await boss.createQueue(name);
  created.add(name);
}

export async function enqueue(name: string, data: object, options: { singletonKey?: string; startAfter?: number } = {}) {
  await ensureQueue(name);
  const boss = await getBoss();
  return boss.send(name, data, { ...DEFAULT_JOB_OPTIONS, ...options });
}
