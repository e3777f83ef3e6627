import type { Knex } from "knex";

// Customers' machines, saved setups pinned to a sheet version, and outcome reports.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("machines", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("vendor_id").notNullable().references("vendors.id").onDelete("CASCADE").index();
    t.uuid("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.text("name").notNullable();
    t.text("preset");
    t.double("rpm_min").notNullable();
    t.double("rpm_max").notNullable();
    t.double("power_kw").notNullable();
    t.double("max_feed_mm_min").notNullable();
    t.double("rigidity").notNullable();
    t.double("z_thrust_n");
    t.double("stickout_mm");
    t.text("units").notNullable().defaultTo("metric");
    t.timestamps(true, true);
    t.index(["vendor_id", "user_id"]);
  });
  await knex.raw(`alter table machines add constraint machines_check check (rpm_min > 0 and rpm_max >= rpm_min
    and power_kw > 0 and max_feed_mm_min > 0 and rigidity > 0 and rigidity <= 1 and units in ('metric','imperial'))`);

  await knex.schema.createTable("setups", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("vendor_id").notNullable().references("vendors.id").onDelete("CASCADE").index();
    t.uuid("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.uuid("machine_id").notNullable().references("machines.id").onDelete("CASCADE");
    t.uuid("sheet_version_id").notNullable().references("sheet_versions.id").index();
    t.integer("operation_index").notNullable().defaultTo(0);
    t.text("name").notNullable().defaultTo("");
    t.jsonb("overrides").notNullable().defaultTo("{}");
    t.jsonb("result").notNullable();
    t.text("units").notNullable().defaultTo("metric");
    t.timestamps(true, true);
    t.index(["vendor_id", "user_id"]);
  });

  await knex.schema.createTable("outcomes", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("vendor_id").notNullable().references("vendors.id").onDelete("CASCADE");
    t.uuid("setup_id").notNullable().references("setups.id").onDelete("CASCADE").index();
    t.uuid("sheet_version_id").notNullable().references("sheet_versions.id");
    t.uuid("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.uuid("machine_id").references("machines.id").onDelete("SET NULL");
    t.text("result").notNullable();
    t.text("symptom");
    t.jsonb("changes").notNullable().defaultTo("{}");
    t.text("notes").notNullable().defaultTo("");
    t.text("photo_key");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["vendor_id", "sheet_version_id"]);
  });
  await knex.raw(`alter table outcomes add constraint outcomes_check check (
    result in ('worked_as_written','worked_after_changes','failed')
    and (symptom is null or symptom in ('chatter','melting_welding','poor_finish','broken_tool','stalled_lost_steps'))
    and ((result = 'failed') = (symptom is not null)))`);

  // Per person and vendor: which e-mails they want (change alerts, weekly digest).
  await knex.schema.createTable("mail_preferences", (t) => {
    t.uuid("vendor_id").notNullable().references("vendors.id").onDelete("CASCADE");
    t.uuid("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.boolean("change_alerts").notNullable().defaultTo(true);
    t.boolean("weekly_digest").notNullable().defaultTo(true);
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(["vendor_id", "user_id"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ["mail_preferences", "outcomes", "setups", "machines"]) await knex.schema.dropTableIfExists(table);
}
