import "server-only";

import type { Knex } from "knex";

import { db } from "@/lib/db/knex";

/**
 * Marks a vendor's Library as changed inside the change's transaction: stored Library pages rendered before it
 * (lib/library/page-store.ts) stop being served on every app instance the moment the change commits, and the
 * Library's 'use cache' entries are keyed by the number, so a page rendered after it reads the new state.
 */
export async function bumpLibraryGeneration(trx: Knex.Transaction, vendorId: string): Promise<void> {
  await trx.raw(
    `insert into library_generations (vendor_id, generation) values (?, 1)
     on conflict (vendor_id) do update set generation = library_generations.generation + 1`,
    [vendorId],
  );
}

/** The vendor's current Library generation (0 before its first change), read from the primary. */
export async function readLibraryGeneration(vendorId: string, from: Knex = db): Promise<string> {
  const row = await from("library_generations").where({ vendor_id: vendorId }).first<{ generation: string } | undefined>("generation");
  return row ? String(row.generation) : "0";
}
