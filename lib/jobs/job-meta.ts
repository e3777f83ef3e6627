/** What a handler may know of the job it runs: its id, stable across retries. */
export type JobMeta = { id: string; retryCount: number };
