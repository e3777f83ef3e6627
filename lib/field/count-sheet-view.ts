import "server-only";

import { db } from "@/lib/db/knex";

// Library page views are added up in memory and written in one statement every couple of seconds, so a page
// view costs no database round trip and readers of one sheet never queue on its counter row. A process that dies
// loses the views of its last interval at most (a counter for Field results, never who it was).
const FLUSH_MS = 2_000;
const MOST_PENDING = 10_000;

type Pending = { vendorId: string; versionId: string; views: number };
let pending = new Map<string, Pending>();
let timer: NodeJS.Timeout | null = null;
let warnedFull = false;

// Only this vendor's readable versions count; anything else is dropped without a trace.
const FLUSH = `insert into sheet_version_activity (vendor_id, sheet_version_id, day, views)
  select v.vendor_id, v.id, current_date, x.views
  from jsonb_to_recordset(?::jsonb) as x(vendor_id uuid, version_id uuid, views int)
  join sheet_versions v on v.id = x.version_id and v.vendor_id = x.vendor_id and v.state in ('published', 'superseded', 'withdrawn')
  on conflict (sheet_version_id, day) do update set views = sheet_version_activity.views + excluded.views`;

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

function add(entry: Pending) {
  const key = `${entry.vendorId}:${entry.versionId}`;
  const known = pending.get(key);
  if (known) known.views += entry.views;
  else if (pending.size < MOST_PENDING) pending.set(key, { ...entry });
  else if (!warnedFull) {
    warnedFull = true;
    console.error("[field] too many sheet versions waiting to be counted; views are dropped until the next write");
  }
}

/** Writes the views counted so far; a failed write keeps them for the next turn. */
export async function flushSheetViews(): Promise<void> {
  if (timer) clearTimeout(timer);
  timer = null;
  if (!pending.size) return;
  const batch = [...pending.values()];
  pending = new Map();
  warnedFull = false;
  try {
    await db.raw(FLUSH, [JSON.stringify(batch.map((b) => ({ vendor_id: b.vendorId, version_id: b.versionId, views: b.views })))]);
  } catch (error) {
    console.error("[field] could not write sheet views; kept for the next turn", error);
    for (const entry of batch) add(entry);
    schedule();
  }
}

function schedule() {
  if (timer) return;
  timer = setTimeout(() => void flushSheetViews(), FLUSH_MS);
  timer.unref();
}

/** A Library page view, counted for Field results (written within a few seconds); never reaches the reader. */
export function countSheetView(vendorId: string, versionId: string): void {
  if (!UUID.test(vendorId) || !UUID.test(versionId)) return;
  add({ vendorId, versionId, views: 1 });
  schedule();
}
