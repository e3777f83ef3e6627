import type { Knex } from "knex";

// A per-person counter carried in each session token: raising it (password replaced, removed from a vendor) ends
// every session issued before.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("users", (t) => {
    t.integer("session_epoch").notNullable().defaultTo(0);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("users", (t) => {
    t.dropColumn("session_epoch");
  });
}
