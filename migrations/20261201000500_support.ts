import type { Knex } from "knex";

const vendorOwned = (knex: Knex, t: Knex.CreateTableBuilder) => {
  t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
  t.uuid("vendor_id").notNullable().references("vendors.id").onDelete("CASCADE");
};

// Support: tickets, their thread, attachments, linked sheet versions, desk views and snippets,
// hand-offs to engineering and the log of inbound reply mails.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("tickets", (t) => {
    vendorOwned(knex, t);
    t.integer("number").notNullable();
    t.uuid("customer_id").notNullable().references("users.id").onDelete("CASCADE");
    t.text("subject").notNullable();
    t.text("body").notNullable();
    t.text("status").notNullable().defaultTo("new");
    t.text("priority").notNullable().defaultTo("normal");
    t.uuid("assignee_id").references("users.id").onDelete("SET NULL");
    t.uuid("material_id").references("materials.id").onDelete("SET NULL");
    t.uuid("machine_id").references("machines.id").onDelete("SET NULL");
    t.specificType("tags", "text[]").notNullable().defaultTo("{}");
    t.text("idempotency_key").notNullable();
    t.timestamp("first_response_due_at", { useTz: true }).notNullable();
    t.timestamp("first_response_at", { useTz: true });
    t.timestamp("closed_at", { useTz: true });
    t.integer("satisfaction");
    t.text("satisfaction_comment");
    t.timestamp("last_activity_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamps(true, true);
    t.unique(["vendor_id", "number"]);
    // A double submit carries the same client key: the second insert hits this and returns the first ticket.
    t.unique(["vendor_id", "customer_id", "idempotency_key"]);
    t.index(["vendor_id", "status"]);
    t.index(["vendor_id", "customer_id"]);
  });
  await knex.raw(`alter table tickets add constraint tickets_check check (
    status in ('new','in_progress','waiting_on_customer','answered','closed')
    and priority in ('low','normal','high','urgent')
    and (satisfaction is null or satisfaction between 1 and 5))`);

  await knex.schema.createTable("ticket_sheet_links", (t) => {
    vendorOwned(knex, t);
    t.uuid("ticket_id").notNullable().references("tickets.id").onDelete("CASCADE");
    t.uuid("sheet_version_id").notNullable().references("sheet_versions.id").onDelete("CASCADE");
    t.uuid("machine_id").references("machines.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["ticket_id", "sheet_version_id"]);
    t.index(["vendor_id", "sheet_version_id"]);
  });

  await knex.schema.createTable("ticket_messages", (t) => {
    vendorOwned(knex, t);
    t.uuid("ticket_id").notNullable().references("tickets.id").onDelete("CASCADE");
    t.uuid("author_id").references("users.id").onDelete("SET NULL");
    t.text("visibility").notNullable();
    t.text("source").notNullable().defaultTo("web");
    t.text("body").notNullable();
    t.jsonb("card");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["vendor_id", "ticket_id", "created_at"]);
  });
  await knex.raw(`alter table ticket_messages add constraint ticket_messages_check check (
    visibility in ('public','note') and source in ('web','email','api'))`);

  await knex.schema.createTable("ticket_attachments", (t) => {
    vendorOwned(knex, t);
    // Null until the ticket it was uploaded for is created.
    t.uuid("ticket_id").references("tickets.id").onDelete("CASCADE");
    t.uuid("message_id").references("ticket_messages.id").onDelete("SET NULL");
    t.uuid("uploaded_by").notNullable().references("users.id").onDelete("CASCADE");
    t.text("storage_key").notNullable().unique();
    t.text("file_name").notNullable();
    t.text("content_type").notNullable();
    t.text("kind").notNullable();
    t.integer("size_bytes").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["vendor_id", "ticket_id"]);
  });
  await knex.raw("alter table ticket_attachments add constraint ticket_attachments_kind_check check (kind in ('image','pdf','text'))");

  await knex.schema.createTable("desk_views", (t) => {
    vendorOwned(knex, t);
    t.uuid("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.text("name").notNullable();
    t.jsonb("filters").notNullable().defaultTo("{}");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["vendor_id", "user_id", "name"]);
  });

  await knex.schema.createTable("reply_snippets", (t) => {
    vendorOwned(knex, t);
    t.text("title").notNullable();
    t.text("body").notNullable();
    t.uuid("created_by").references("users.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["vendor_id", "title"]);
  });

  await knex.schema.createTable("problem_reports", (t) => {
    vendorOwned(knex, t);
    t.uuid("sheet_version_id").notNullable().references("sheet_versions.id").onDelete("CASCADE");
    t.uuid("ticket_id").references("tickets.id").onDelete("SET NULL");
    t.uuid("reported_by").references("users.id").onDelete("SET NULL");
    t.text("summary").notNullable();
    t.text("details").notNullable().defaultTo("");
    t.text("status").notNullable().defaultTo("open");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["vendor_id", "sheet_version_id"]);
  });
  await knex.raw("alter table problem_reports add constraint problem_reports_status_check check (status in ('open','resolved'))");

  // Every inbound reply mail, accepted or dropped, with the reason (no vendor when the address is forged).
  await knex.schema.createTable("inbound_mail_log", (t) => {
    t.bigIncrements("id");
    t.uuid("vendor_id").references("vendors.id").onDelete("CASCADE");
    t.uuid("ticket_id").references("tickets.id").onDelete("SET NULL");
    t.text("mail_from").notNullable().defaultTo("");
    t.text("rcpt_to").notNullable().defaultTo("");
    t.text("outcome").notNullable();
    t.text("reason").notNullable().defaultTo("");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of [
    "inbound_mail_log",
    "problem_reports",
    "reply_snippets",
    "desk_views",
    "ticket_attachments",
    "ticket_messages",
    "ticket_sheet_links",
    "tickets",
  ]) {
    await knex.schema.dropTableIfExists(table);
  }
}
