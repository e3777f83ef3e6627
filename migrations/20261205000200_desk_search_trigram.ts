import type { Knex } from "knex";

// The Desk finds tickets by words of their subject or question (`ilike '%words%'`). Trigram indexes (pg_trgm, made
// by the search migrations) answer that from the index; without them every search read all of a vendor's tickets.
export async function up(knex: Knex): Promise<void> {
  await knex.raw("create extension if not exists pg_trgm");
  await knex.raw("create index if not exists tickets_subject_trgm on tickets using gin (subject gin_trgm_ops)");
  await knex.raw("create index if not exists tickets_body_trgm on tickets using gin (body gin_trgm_ops)");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop index if exists tickets_body_trgm");
  await knex.raw("drop index if exists tickets_subject_trgm");
}
