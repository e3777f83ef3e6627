import "server-only";

import type { Knex } from "knex";

import { db } from "@/lib/db/knex";
import { readDb } from "@/lib/db/read-db";
import { jobWriter } from "@/lib/jobs/boss";
import { DEFAULT_JOB_OPTIONS, ensureQueue } from "@/lib/jobs/enqueue";
import { inTransaction, knexExecutor } from "@/lib/jobs/knex-executor";

export const FIELD_REFRESH_QUEUE = "field.refresh-rollups";
/** Versions recomputed per transaction; a backlog is worked off in several. */
const BATCH = 2_000;

/**
 * Brings both Field-results rollup tables up to date by recomputing only the sheet versions that a write
 * touched since the last refresh (triggers note them in field_rollup_changes), so the cost follows what
 * changed, not the total. Each batch is one transaction: a reader never sees a version's new counts beside
 * its old changes. `rebuild` recomputes every version (after a bulk load with triggers off).
 */
export async function refreshFieldRollups(
  knex: Knex = db,
  { rebuild = false }: { rebuild?: boolean } = {},
): Promise<{ durationMs: number; versions: number }> {
  const started = performance.now();
  let versions = 0;
  for (;;) {
    const done = await knex.transaction(async (trx) => {
      const sql = rebuild ? "select field_rollups_rebuild() as n" : "select field_rollups_refresh_pending(?) as n";
      const { rows } = await trx.raw<{ rows: { n: number }[] }>(sql, rebuild ? [] : [BATCH]);
      await trx("field_rollup_refreshes")
        .insert({ name: "field", refreshed_at: trx.fn.now(), duration_ms: Math.round(performance.now() - started) })
        .onConflict("name")
        .merge();
      return rows[0].n;
    });
    versions += done;
    if (rebuild || done < BATCH) break;
  }
  return { durationMs: Math.round(performance.now() - started), versions };
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
  await inTransaction(trx, (t) =>
    jobWriter().sendDebounced(FIELD_REFRESH_QUEUE, {}, { ...DEFAULT_JOB_OPTIONS, retryLimit: 3, db: knexExecutor(t) }, 20, "field"),
  );
}

export async function lastFieldRefresh(): Promise<Date | null> {
  const row = await (await readDb())("field_rollup_refreshes").where({ name: "field" }).first("refreshed_at");
  return row ? new Date(row.refreshed_at) : null;
}
