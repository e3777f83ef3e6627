import type { Knex } from "knex";

// The PostgreSQL search engine's index: one row per current published sheet version and per cutter.
export async function up(knex: Knex): Promise<void> {
  await knex.raw("create extension if not exists unaccent");
  await knex.raw("create extension if not exists pg_trgm");
  // unaccent() is only STABLE (it reads a dictionary by name); fixing the dictionary makes it safe for indexes.
  await knex.raw(`create or replace function sb_unaccent(text) returns text
    language sql immutable parallel safe strict
    as $$ select public.unaccent('public.unaccent'::regdictionary, $1) $$`);

  await knex.schema.createTable("search_documents", (t) => {
    t.uuid("vendor_id").notNullable().references("vendors.id").onDelete("CASCADE");
    t.text("doc_id").notNullable();
    t.text("kind").notNullable();
    t.uuid("sheet_id");
    t.uuid("version_id");
    t.uuid("cutter_id");
    t.text("slug").notNullable();
    t.integer("version_number");
    t.text("title").notNullable();
    t.text("summary").notNullable().defaultTo("");
    t.text("cutter_sku").notNullable();
    t.text("cutter_name").notNullable();
    t.text("material_name");
    t.specificType("material_names", "text[]").notNullable().defaultTo("{}");
    t.text("material_key");
    t.text("material_group");
    t.specificType("operations", "text[]").notNullable().defaultTo("{}");
    t.text("machine_class");
    t.text("machine_class_name");
    t.double("diameter_mm").notNullable();
    t.integer("flutes").notNullable();
    t.text("corner_form").notNullable();
    t.text("geometry").notNullable();
    t.specificType("tags", "text[]").notNullable().defaultTo("{}");
    t.text("body").notNullable().defaultTo("");
    // Lower-case, unaccented words of the short fields, for pg_trgm typo matching.
    t.text("words").notNullable().defaultTo("");
    t.specificType("search_vector", "tsvector").notNullable();
    t.timestamp("published_at", { useTz: true });
    t.timestamp("indexed_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(["vendor_id", "doc_id"]);
  });
  await knex.raw(`alter table search_documents add constraint search_documents_kind_check check (kind in ('sheet','cutter'))`);
  await knex.raw("create index search_documents_vector on search_documents using gin (search_vector)");
  await knex.raw("create index search_documents_words_trgm on search_documents using gin (words gin_trgm_ops)");
  await knex.raw("create index search_documents_sku_trgm on search_documents using gin (lower(cutter_sku) gin_trgm_ops)");
  await knex.raw("create index search_documents_facets on search_documents (vendor_id, kind, material_key, diameter_mm, flutes)");
  await knex.raw("create index search_documents_operations on search_documents using gin (operations)");
  await knex.raw("create index search_documents_sheet on search_documents (vendor_id, sheet_id)");
  await knex.raw("create index search_documents_cutter on search_documents (vendor_id, cutter_id)");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("search_documents");
  await knex.raw("drop function if exists sb_unaccent(text)");
}
