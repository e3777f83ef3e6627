import type { Knex } from "knex";

// How many dead letters the operator was last told about, per dead-letter queue: the summary mail goes out
// when the list has grown since, not once per failed mail.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("dead_letter_notices", (t) => {
    t.text("queue").primary();
    t.integer("notified_count").notNullable().defaultTo(0);
    t.timestamp("notified_at", { useTz: true });
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("dead_letter_notices");
}
