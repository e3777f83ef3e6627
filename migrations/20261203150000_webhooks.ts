import type { Knex } from "knex";

// Webhooks per vendor and the log of their deliveries. The signing secret is stored encrypted (AES-256-GCM,
// key from WEBHOOK_SECRET_KEY), because signing needs it back; it is shown once, at creation.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("webhooks", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("vendor_id").notNullable().references("id").inTable("vendors").onDelete("CASCADE");
    t.text("url").notNullable();
    t.text("description").notNullable().defaultTo("");
    t.specificType("events", "text[]").notNullable();
    t.text("secret_encrypted").notNullable();
    t.text("secret_hint").notNullable();
    t.text("state").notNullable().defaultTo("active");
    t.integer("consecutive_failures").notNullable().defaultTo(0);
    t.timestamp("paused_at", { useTz: true });
    t.uuid("created_by").references("id").inTable("users").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["vendor_id"]);
  });
  await knex.raw("alter table webhooks add constraint webhooks_state_check check (state in ('active', 'paused'))");

  await knex.schema.createTable("webhook_deliveries", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("vendor_id").notNullable().references("id").inTable("vendors").onDelete("CASCADE");
    t.uuid("webhook_id").notNullable().references("id").inTable("webhooks").onDelete("CASCADE");
    t.uuid("event_id").notNullable();
    t.text("event_type").notNullable();
    t.text("body").notNullable();
    t.text("state").notNullable().defaultTo("pending");
    t.integer("attempts").notNullable().defaultTo(0);
    t.integer("last_status");
    t.text("last_error");
    t.text("response_excerpt");
    t.integer("duration_ms");
    t.timestamp("last_attempt_at", { useTz: true });
    t.timestamp("next_attempt_at", { useTz: true });
    t.timestamp("delivered_at", { useTz: true });
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["webhook_id", "event_id"]);
    t.index(["vendor_id", "webhook_id", "created_at"]);
  });
  await knex.raw(
    "alter table webhook_deliveries add constraint webhook_deliveries_state_check check (state in ('pending', 'retrying', 'delivered', 'failed', 'held'))",
  );
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("webhook_deliveries");
  await knex.schema.dropTableIfExists("webhooks");
}
