import type { Knex } from "knex";

// The distinct words of each vendor's index, for typo matching: a misspelt word is matched by
// pg_trgm against this short list, and the close words join the full-text query (which keeps its GIN index).
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("search_words", (t) => {
    t.uuid("vendor_id").notNullable().references("vendors.id").onDelete("CASCADE");
    t.text("word").notNullable();
    t.primary(["vendor_id", "word"]);
  });
  await knex.raw("create index search_words_trgm on search_words using gin (word gin_trgm_ops)");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("search_words");
}
