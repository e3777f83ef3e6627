import type { Knex } from "knex";

// One row per change-alert e-mail: a retried job finds the row and sends nothing twice.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("change_alerts_sent", (t) => {
    t.uuid("vendor_id").notNullable().references("vendors.id").onDelete("CASCADE");
    t.uuid("version_id").notNullable().references("sheet_versions.id").onDelete("CASCADE");
    t.uuid("superseded_version_id").notNullable().references("sheet_versions.id").onDelete("CASCADE");
    t.uuid("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.integer("setup_count").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(["version_id", "user_id"]);
    t.index(["vendor_id", "user_id"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("change_alerts_sent");
}
