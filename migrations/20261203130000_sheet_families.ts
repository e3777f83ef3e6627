import type { Knex } from "knex";

// Sheet families: a cutter selection × materials × machine classes with versioned rules; batches of drafts the
// engine generated from one rules version, reviewed and published together; one item per cell of a batch.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("families", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("vendor_id").notNullable().references("vendors.id").onDelete("CASCADE").index();
    t.text("slug").notNullable();
    t.text("name").notNullable();
    t.jsonb("cutter_selection").notNullable();
    t.specificType("material_ids", "uuid[]").notNullable();
    t.specificType("machine_class_ids", "uuid[]").notNullable();
    t.uuid("created_by").references("users.id").onDelete("SET NULL");
    t.timestamps(true, true);
    t.unique(["vendor_id", "slug"]);
  });
  await knex.schema.createTable("family_rule_sets", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("vendor_id").notNullable().references("vendors.id").onDelete("CASCADE").index();
    t.uuid("family_id").notNullable().references("families.id").onDelete("CASCADE");
    t.integer("number").notNullable();
    t.jsonb("rules").notNullable();
    t.text("note").notNullable().defaultTo("");
    t.uuid("created_by").references("users.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["family_id", "number"]);
  });
  await knex.schema.createTable("family_batches", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("vendor_id").notNullable().references("vendors.id").onDelete("CASCADE").index();
    t.uuid("family_id").notNullable().references("families.id").onDelete("CASCADE");
    t.integer("number").notNullable();
    t.uuid("rule_set_id").notNullable().references("family_rule_sets.id");
    t.text("state").notNullable().defaultTo("generating");
    t.integer("total").notNullable().defaultTo(0);
    t.integer("done").notNullable().defaultTo(0);
    t.text("error");
    t.uuid("created_by").references("users.id").onDelete("SET NULL");
    t.uuid("approved_by").references("users.id").onDelete("SET NULL");
    t.timestamp("approved_at", { useTz: true });
    t.uuid("published_by").references("users.id").onDelete("SET NULL");
    t.timestamp("published_at", { useTz: true });
    t.timestamps(true, true);
    t.unique(["family_id", "number"]);
  });
  await knex.raw(`alter table family_batches add constraint family_batches_state_check
    check (state in ('generating','in_review','approved','published','failed'))`);
  await knex.schema.createTable("family_batch_items", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("vendor_id").notNullable().references("vendors.id").onDelete("CASCADE").index();
    t.uuid("batch_id").notNullable().references("family_batches.id").onDelete("CASCADE");
    t.uuid("cutter_id").notNullable().references("cutters.id").onDelete("CASCADE");
    t.uuid("material_id").notNullable().references("materials.id").onDelete("CASCADE");
    t.uuid("machine_class_id").notNullable().references("machine_classes.id").onDelete("CASCADE");
    t.uuid("sheet_id").references("sheets.id").onDelete("CASCADE");
    t.uuid("version_id").references("sheet_versions.id").onDelete("SET NULL").index();
    t.uuid("previous_version_id").references("sheet_versions.id").onDelete("SET NULL");
    // created | new-version | unchanged | blocked (a warned cell) | busy (the sheet has an open draft of its own)
    t.text("outcome").notNullable();
    t.jsonb("warnings").notNullable().defaultTo("[]");
    t.jsonb("provenance").notNullable().defaultTo("[]");
    t.text("excluded_reason");
    t.uuid("excluded_by").references("users.id").onDelete("SET NULL");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["batch_id", "cutter_id", "material_id", "machine_class_id"]);
  });
  await knex.raw(`alter table family_batch_items add constraint family_batch_items_outcome_check
    check (outcome in ('created','new-version','unchanged','blocked','busy'))`);
  // Finding a cell's sheet by its catalogue triple.
  await knex.raw("create index if not exists sheets_vendor_triple on sheets (vendor_id, cutter_id, material_id, machine_class_id)");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop index if exists sheets_vendor_triple");
  await knex.schema.dropTableIfExists("family_batch_items");
  await knex.schema.dropTableIfExists("family_batches");
  await knex.schema.dropTableIfExists("family_rule_sets");
  await knex.schema.dropTableIfExists("families");
}
