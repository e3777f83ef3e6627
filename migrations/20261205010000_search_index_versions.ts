import type { Knex } from "knex";

const TABLES = ["search_documents", "search_words"] as const;
const EVENTS = [
  ["insert", "new"],
  ["update", "new"],
  ["delete", "old"],
] as const;

// A counter per vendor that every change to the vendor's search index moves, in the changing transaction: a search
// that relaxed can then trust what it learnt about the vendor's index (which earlier steps matched nothing) for as
// long as the counter it read then still stands. Triggers rather than the engine's writes, so no writer can forget it.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("search_index_versions", (t) => {
    t.uuid("vendor_id").primary().references("vendors.id").onDelete("CASCADE");
    t.bigInteger("version").notNullable().defaultTo(0);
  });
  await knex.raw(`create function sb_bump_search_index_version() returns trigger language plpgsql as $$
    begin
      -- Not for a vendor being deleted (its documents go with it, and so does its version).
      insert into search_index_versions as s (vendor_id, version)
        select distinct c.vendor_id, 1 from changed c join vendors v on v.id = c.vendor_id
        on conflict (vendor_id) do update set version = s.version + 1;
      return null;
    end $$`);
  // A truncate names no rows: every vendor's version moves.
  await knex.raw(`create function sb_bump_every_search_index_version() returns trigger language plpgsql as $$
    begin
      update search_index_versions set version = version + 1;
      return null;
    end $$`);
  // Transition tables allow one event per trigger, hence three per table.
  for (const table of TABLES) {
    for (const [event, rows] of EVENTS)
      await knex.raw(`create trigger ${table}_${event}_version after ${event} on ${table}
        referencing ${rows} table as changed for each statement execute function sb_bump_search_index_version()`);
    await knex.raw(`create trigger ${table}_truncate_version after truncate on ${table}
      for each statement execute function sb_bump_every_search_index_version()`);
  }
}

export async function down(knex: Knex): Promise<void> {
  for (const table of TABLES)
    for (const event of [...EVENTS.map(([e]) => e), "truncate"])
      await knex.raw(`drop trigger if exists ${table}_${event}_version on ${table}`);
  await knex.raw("drop function if exists sb_bump_search_index_version()");
  await knex.raw("drop function if exists sb_bump_every_search_index_version()");
  await knex.schema.dropTableIfExists("search_index_versions");
}
