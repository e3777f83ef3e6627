import type { Knex } from "knex";

// Mail preferences become one row per person, vendor and kind of mail (change alerts, weekly digest, ticket
// notifications, batch mails), so a new kind needs no new column; no row means "on". The two columns of the first
// table are carried over as rows. "My cutters": the cutters a customer keeps in their shop, per vendor.
const KINDS = ["change_alerts", "weekly_digest", "ticket_notifications", "batch_changes"];

export async function up(knex: Knex): Promise<void> {
  await knex.schema.renameTable("mail_preferences", "mail_preferences_v1");
  await knex.raw("alter table mail_preferences_v1 rename constraint mail_preferences_pkey to mail_preferences_v1_pkey");
  await knex.schema.createTable("mail_preferences", (t) => {
    t.uuid("vendor_id").notNullable().references("vendors.id").onDelete("CASCADE");
    t.uuid("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.text("kind").notNullable();
    t.boolean("enabled").notNullable();
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(["vendor_id", "user_id", "kind"]);
  });
  // DDL takes no bind parameters; the kinds are this file's own constants.
  await knex.raw(
    `alter table mail_preferences add constraint mail_preferences_kind check (kind in (${KINDS.map((k) => `'${k}'`).join(", ")}))`,
  );
  await knex.raw(`insert into mail_preferences (vendor_id, user_id, kind, enabled, updated_at)
    select vendor_id, user_id, 'change_alerts', change_alerts, updated_at from mail_preferences_v1
    union all
    select vendor_id, user_id, 'weekly_digest', weekly_digest, updated_at from mail_preferences_v1`);
  await knex.schema.dropTable("mail_preferences_v1");

  await knex.schema.createTable("customer_cutters", (t) => {
    t.uuid("vendor_id").notNullable().references("vendors.id").onDelete("CASCADE");
    t.uuid("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.uuid("cutter_id").notNullable().references("cutters.id").onDelete("CASCADE");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(["vendor_id", "user_id", "cutter_id"]);
    t.index(["vendor_id"]);
    t.index(["cutter_id"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists("customer_cutters");
  await knex.schema.createTable("mail_preferences_v1", (t) => {
    t.uuid("vendor_id").notNullable().references("vendors.id").onDelete("CASCADE");
    t.uuid("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.boolean("change_alerts").notNullable().defaultTo(true);
    t.boolean("weekly_digest").notNullable().defaultTo(true);
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(["vendor_id", "user_id"]);
  });
  await knex.raw(`insert into mail_preferences_v1 (vendor_id, user_id, change_alerts, weekly_digest, updated_at)
    select vendor_id, user_id,
      coalesce(bool_and(enabled) filter (where kind = 'change_alerts'), true),
      coalesce(bool_and(enabled) filter (where kind = 'weekly_digest'), true),
      max(updated_at)
    from mail_preferences where kind in ('change_alerts', 'weekly_digest') group by vendor_id, user_id`);
  await knex.schema.dropTable("mail_preferences");
  await knex.schema.renameTable("mail_preferences_v1", "mail_preferences");
  await knex.raw("alter table mail_preferences rename constraint mail_preferences_v1_pkey to mail_preferences_pkey");
}
