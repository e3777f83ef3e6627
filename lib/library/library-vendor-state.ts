// The one read the proxy makes before it answers with a stored Library page: is the vendor's Library public, and
// which generation is current (lib/library/library-generation.ts). It runs in the proxy's bundle, so it keeps a
// small pool of its own on globalThis rather than the app's knex pool. Single statements only: fine through
// PgBouncer in transaction mode.
import pg from "pg";

import { databaseUrl } from "@/lib/db/config";

export type LibraryVendorState = { id: string; libraryPublic: boolean; generation: string };

const KEY = Symbol.for("swarfbook.library.vendorStatePool");

function pool(): pg.Pool {
  const holder = globalThis as typeof globalThis & { [KEY]?: pg.Pool };
  if (!holder[KEY]) {
    holder[KEY] = new pg.Pool({ connectionString: databaseUrl(), max: Number(process.env.LIBRARY_PAGE_STORE_POOL_MAX ?? 4) });
    // An idle connection that breaks must not take the process down; the next query opens another.
    holder[KEY].on("error", () => undefined);
  }
  return holder[KEY];
}

const QUERY = `select v.id, coalesce((v.settings->>'libraryPublic')::boolean, true) as library_public,
  coalesce(g.generation, 0)::text as generation
  from vendors v left join library_generations g on g.vendor_id = v.id
  where v.slug = $1`;

async function read(slug: string): Promise<LibraryVendorState | null> {
  const { rows } = await pool().query<{ id: string; library_public: boolean; generation: string }>(QUERY, [slug]);
  const row = rows[0];
  return row ? { id: row.id, libraryPublic: row.library_public, generation: row.generation } : null;
}

type Reads = { running: Promise<LibraryVendorState | null> | null; next: Promise<LibraryVendorState | null> | null };
const reads = new Map<string, Reads>();

function start(slug: string, slot: Reads): Promise<LibraryVendorState | null> {
  const running: Promise<LibraryVendorState | null> = read(slug).finally(() => {
    if (slot.running !== running) return;
    slot.running = null;
    if (!slot.next) reads.delete(slug);
  });
  slot.running = running;
  return running;
}

/**
 * The vendor's state as committed when this call was made, or later. Concurrent readers of one vendor share a read,
 * but only one that starts after they asked: a read already running may have started before a change committed
 * that the caller must see. So at most one read runs and one waits per vendor, however many readers there are.
 */
export function findLibraryVendorState(slug: string): Promise<LibraryVendorState | null> {
  let slot = reads.get(slug);
  if (!slot) reads.set(slug, (slot = { running: null, next: null }));
  if (!slot.running) return start(slug, slot);
  const waiting = slot;
  slot.next ??= slot.running
    .then(
      () => undefined,
      () => undefined,
    )
    .then(() => {
      waiting.next = null;
      return start(slug, waiting);
    });
  return slot.next;
}
