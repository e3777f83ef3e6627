import type { Knex } from "knex";

// A counter per vendor that every change a Library page shows bumps inside the change's own transaction
// (publish, supersede, withdraw, catalogue edits, branding and the customers-only setting). A stored Library page
// remembers the number it was rendered under and is served only while the number is unchanged, on every app
// instance: the check is one indexed read, and it sees the change as soon as the change has committed.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("library_generations", (t) => {
    t.uuid("vendor_id").primary().references("vendors.id").onDelete("CASCADE");
    t.bigInteger("generation").notNullable().defaultTo(0);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("library_generations");
}
