import type { Knex } from "knex";

// A retried delivery of the same reply posts once: the Message-ID (or a digest of the message when it has none)
// is stored with the message it became, unique per ticket.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("ticket_messages", (t) => {
    t.text("email_message_key");
  });
  await knex.raw(
    "create unique index ticket_messages_email_key on ticket_messages (ticket_id, email_message_key) where email_message_key is not null",
  );
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop index if exists ticket_messages_email_key");
  await knex.schema.alterTable("ticket_messages", (t) => {
    t.dropColumn("email_message_key");
  });
}
