import type { Knex } from "knex";

// Stored files whose rows are gone wait here until the cleanup job deletes them from storage (the row is written in
// the transaction that drops the file's owner, so no file is forgotten); outcome photos record their size for the
// per-person upload quota.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("upload_deletions", (t) => {
    t.text("storage_key").primary();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
  await knex.schema.alterTable("outcomes", (t) => {
    t.integer("photo_size_bytes");
  });
  await knex.raw("create index ticket_attachments_uploader on ticket_attachments (uploaded_by)");
  await knex.raw("create index ticket_attachments_unattached on ticket_attachments (created_at) where ticket_id is null");
  await knex.raw("create index outcomes_photo_owner on outcomes (user_id) where photo_key is not null");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop index if exists outcomes_photo_owner");
  await knex.raw("drop index if exists ticket_attachments_unattached");
  await knex.raw("drop index if exists ticket_attachments_uploader");
  await knex.schema.alterTable("outcomes", (t) => {
    t.dropColumn("photo_size_bytes");
  });
  await knex.schema.dropTableIfExists("upload_deletions");
}
