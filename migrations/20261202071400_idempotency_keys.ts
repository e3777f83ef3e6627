import type { Knex } from "knex";

// Replies, outcome reports and hand-offs carry the client's idempotency key, like tickets: a resubmit
// (a retried request after a timeout, a second click) returns the first row instead of adding another.
const TABLES = [
  { table: "ticket_messages", actor: "author_id" },
  { table: "outcomes", actor: "user_id" },
  { table: "problem_reports", actor: "reported_by" },
] as const;

export async function up(knex: Knex): Promise<void> {
  for (const { table, actor } of TABLES) {
    await knex.schema.alterTable(table, (t) => t.text("idempotency_key"));
    await knex.raw(
      `create unique index ${table}_idempotency_key on ${table} (vendor_id, ${actor}, idempotency_key) where idempotency_key is not null`,
    );
  }
}

export async function down(knex: Knex): Promise<void> {
  for (const { table } of TABLES) {
    await knex.raw(`drop index if exists ${table}_idempotency_key`);
    await knex.schema.alterTable(table, (t) => t.dropColumn("idempotency_key"));
  }
}
