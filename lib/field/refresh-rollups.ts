import "server-only";

import type { Knex } from "knex";

import { db } from "@/lib/db/knex";
import { jobWriter } from "@/lib/jobs/boss";
import { DEFAULT_JOB_OPTIONS, ensureQueue } from "@/lib/jobs/enqueue";
import { inTransaction, knexExecutor } from "@/lib/jobs/knex-executor";

export const FIELD_REFRESH_QUEUE = "field.refresh-rollups";
const VIEWS = ["field_version_rollups", "field_change_rollups"] as const;

/**
 * Rebuilds both Field-results rollups. CONCURRENTLY keeps the old rows readable while the new ones are built,
 * so a page view never waits for a refresh.
 */
export async function refreshFieldRollups(knex: Knex = db): Promise<{ durationMs: number }> {
  const started = performance.now();
  // One transaction, so a reader never sees new version rollups beside old change rollups.
  await knex.transaction(async (trx) => {
    for (const view of VIEWS) await trx.raw(`refresh materialized view concurrently ${view}`);
    await trx("field_rollup_refreshes").insert({ name: "field", refreshed_at: trx.fn.now(), duration_ms: Math.round(performance.now() - started) }).onConflict("name").merge();
  });
  const durationMs = Math.round(performance.now() - started);
  return { durationMs };
}

export async function refreshFieldRollupsJob(): Promise<void> {
  await refreshFieldRollups();
}

/**
 * After a new outcome or hand-off: one refresh per 20 s at most, however many reports arrive.
 * Queued in the report's own transaction, so a saved report always brings its refresh.
 */
export async function scheduleFieldRefresh(trx: Knex | Knex.Transaction): Promise<void> {
  await ensureQueue(FIELD_REFRESH_QUEUE);
  await inTransaction(trx, (t) => jobWriter().sendDebounced(FIELD_REFRESH_QUEUE, {}, { ...DEFAULT_JOB_OPTIONS, retryLimit: 3, db: knexExecutor(t) }, 20, "field"));
}

export async function lastFieldRefresh(): Promise<Date | null> {
  const row = await db("field_rollup_refreshes").where({ name: "field" }).first("refreshed_at");
  return row ? new Date(row.refreshed_at) : null;
}
