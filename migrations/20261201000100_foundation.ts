import type { Knex } from "knex";

export async function up(knex: Knex): Promise<void> {
  await knex.raw("create extension if not exists citext");

  await knex.schema.createTable("vendors", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.specificType("slug", "citext").notNullable().unique();
    t.text("name").notNullable();
    t.string("accent_color", 7).notNullable().defaultTo("#2f5d8a");
    t.binary("logo");
    t.text("logo_type");
    t.jsonb("settings").notNullable().defaultTo("{}");
    t.timestamps(true, true);
  });

  await knex.schema.createTable("users", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.specificType("email", "citext").notNullable().unique();
    t.text("name").notNullable().defaultTo("");
    t.text("password_hash");
    t.timestamp("email_verified", { useTz: true });
    t.boolean("is_operator").notNullable().defaultTo(false);
    t.timestamps(true, true);
  });

  await knex.schema.createTable("members", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("vendor_id").notNullable().references("vendors.id").onDelete("CASCADE").index();
    t.uuid("user_id").notNullable().references("users.id").onDelete("CASCADE").index();
    t.text("role").notNullable();
    t.timestamps(true, true);
    t.unique(["vendor_id", "user_id"]);
  });
  await knex.raw("alter table members add constraint members_role_check check (role in ('admin','engineer','support','customer'))");

  await knex.schema.createTable("invitations", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("vendor_id").notNullable().references("vendors.id").onDelete("CASCADE").index();
    t.specificType("email", "citext").notNullable();
    t.text("role").notNullable();
    t.text("token_hash").notNullable().unique();
    t.uuid("invited_by").references("users.id").onDelete("SET NULL");
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("accepted_at", { useTz: true });
    t.timestamp("revoked_at", { useTz: true });
    t.timestamps(true, true);
  });
  await knex.raw("alter table invitations add constraint invitations_role_check check (role in ('admin','engineer','support','customer'))");

  // next-auth e-mail provider tokens (stored hashed by next-auth itself).
  await knex.schema.createTable("verification_tokens", (t) => {
    t.text("identifier").notNullable();
    t.text("token").notNullable();
    t.timestamp("expires", { useTz: true }).notNullable();
    t.primary(["identifier", "token"]);
  });

  await knex.schema.createTable("api_tokens", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("vendor_id").notNullable().references("vendors.id").onDelete("CASCADE").index();
    t.uuid("user_id").notNullable().references("users.id").onDelete("CASCADE").index();
    t.text("name").notNullable();
    t.text("prefix").notNullable();
    t.text("token_hash").notNullable().unique();
    t.timestamp("last_used_at", { useTz: true });
    t.timestamp("revoked_at", { useTz: true });
    t.timestamps(true, true);
  });

  await knex.schema.createTable("audit_log", (t) => {
    t.bigIncrements("id");
    t.uuid("vendor_id").references("vendors.id").onDelete("CASCADE");
    t.uuid("actor_user_id").references("users.id").onDelete("SET NULL");
    t.text("action").notNullable();
    t.text("object_type").notNullable();
    t.text("object_id");
    t.jsonb("details").notNullable().defaultTo("{}");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["vendor_id", "created_at"]);
  });

  await knex.schema.createTable("rate_limit_buckets", (t) => {
    t.text("key").primary();
    t.timestamp("window_start", { useTz: true }).notNullable();
    t.integer("hits").notNullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of [
    "rate_limit_buckets",
    "audit_log",
    "api_tokens",
    "verification_tokens",
    "invitations",
    "members",
    "users",
    "vendors",
  ]) {
    await knex.schema.dropTableIfExists(table);
  }
}
