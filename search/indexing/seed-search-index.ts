import type { Knex } from "knex";

import { createPostgresEngine } from "@/search/engines/postgres/postgres-engine";

import { reindexVendor } from "./reindex";

/** Seed step: the PostgreSQL index of every vendor, so a fresh database searches at once. */
export async function seedSearchIndex(knex: Knex): Promise<{ vendors: number; documents: number }> {
  const engine = createPostgresEngine(knex);
  const vendors: { id: string }[] = await knex("vendors").select("id");
  let documents = 0;
  for (const { id } of vendors) {
    const { sheets, cutters } = await reindexVendor({ engine, knex, vendorId: id });
    documents += sheets + cutters;
  }
  return { vendors: vendors.length, documents };
}
