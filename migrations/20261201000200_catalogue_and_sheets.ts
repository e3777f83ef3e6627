import type { Knex } from "knex";

const vendorOwned = (knex: Knex, t: Knex.CreateTableBuilder) => {
  t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
  t.uuid("vendor_id").notNullable().references("vendors.id").onDelete("CASCADE").index();
};

export async function up(knex: Knex): Promise<void> {
  // Field names follow ISO 13399 properties where one exists (DC, APMX, OAL, DMM, ZEFP, RE).
  await knex.schema.createTable("cutters", (t) => {
    vendorOwned(knex, t);
    t.text("sku").notNullable();
    t.text("name").notNullable();
    t.double("diameter_mm").notNullable(); // DC
    t.integer("flutes").notNullable(); // ZEFP
    t.double("flute_length_mm").notNullable(); // APMX
    t.double("overall_length_mm").notNullable(); // OAL
    t.double("shank_mm").notNullable(); // DMM
    t.text("corner_form").notNullable().defaultTo("square");
    t.double("corner_radius_mm"); // RE
    t.double("helix_deg");
    t.text("tool_material").notNullable().defaultTo("carbide");
    t.text("coating");
    t.text("geometry").notNullable().defaultTo("straight");
    t.text("notes").notNullable().defaultTo("");
    t.text("short_code").notNullable().unique();
    t.text("image_key");
    t.timestamps(true, true);
    t.unique(["vendor_id", "sku"]);
  });
  await knex.raw(`alter table cutters
    add constraint cutters_corner_check check (corner_form in ('square','ball','corner-radius')),
    add constraint cutters_material_check check (tool_material in ('carbide','hss')),
    add constraint cutters_geometry_check check (geometry in ('straight','single-flute','upcut','downcut','compression','o-flute')),
    add constraint cutters_sizes_check check (diameter_mm > 0 and flutes between 1 and 12 and flute_length_mm > 0
      and overall_length_mm >= flute_length_mm and shank_mm > 0)`);

  await knex.schema.createTable("materials", (t) => {
    vendorOwned(knex, t);
    t.text("slug").notNullable();
    t.text("name").notNullable();
    t.text("material_group").notNullable();
    t.double("vc_min_mpm").notNullable();
    t.double("vc_max_mpm").notNullable();
    t.double("min_chip_load_mm").notNullable();
    t.double("kc_nmm2").notNullable();
    t.specificType("synonyms", "text[]").notNullable().defaultTo("{}");
    t.jsonb("cautions").notNullable().defaultTo("[]");
    t.text("notes").notNullable().defaultTo("");
    t.timestamps(true, true);
    t.unique(["vendor_id", "slug"]);
  });
  await knex.raw(`alter table materials
    add constraint materials_group_check check (material_group in ('plastics','wood','non-ferrous','ferrous','composites')),
    add constraint materials_window_check check (vc_min_mpm > 0 and vc_max_mpm >= vc_min_mpm and min_chip_load_mm >= 0 and kc_nmm2 > 0)`);

  await knex.schema.createTable("machine_classes", (t) => {
    vendorOwned(knex, t);
    t.text("slug").notNullable();
    t.text("name").notNullable();
    t.text("description").notNullable().defaultTo("");
    t.double("rpm_min").notNullable();
    t.double("rpm_max").notNullable();
    t.double("power_kw").notNullable();
    t.double("max_feed_mm_min").notNullable();
    t.double("rigidity").notNullable();
    t.double("z_thrust_n");
    t.timestamps(true, true);
    t.unique(["vendor_id", "slug"]);
  });
  await knex.raw(`alter table machine_classes add constraint machine_classes_check
    check (rpm_min > 0 and rpm_max >= rpm_min and power_kw > 0 and max_feed_mm_min > 0 and rigidity > 0 and rigidity <= 1)`);

  await knex.schema.createTable("sheets", (t) => {
    vendorOwned(knex, t);
    t.text("slug").notNullable();
    t.uuid("cutter_id").notNullable().references("cutters.id").index();
    t.uuid("material_id").notNullable().references("materials.id").index();
    t.uuid("machine_class_id").notNullable().references("machine_classes.id").index();
    t.uuid("created_by").references("users.id").onDelete("SET NULL");
    t.timestamps(true, true);
    t.unique(["vendor_id", "slug"]);
  });

  await knex.schema.createTable("sheet_versions", (t) => {
    vendorOwned(knex, t);
    t.uuid("sheet_id").notNullable().references("sheets.id").onDelete("CASCADE").index();
    t.integer("number").notNullable();
    t.text("state").notNullable().defaultTo("draft");
    t.text("title").notNullable();
    t.text("source").notNullable();
    t.jsonb("front_matter").notNullable();
    t.text("change_note").notNullable().defaultTo("");
    t.integer("revision").notNullable().defaultTo(1);
    t.uuid("author_id").references("users.id").onDelete("SET NULL");
    t.uuid("updated_by").references("users.id").onDelete("SET NULL");
    t.timestamp("submitted_at", { useTz: true });
    t.uuid("approved_by").references("users.id").onDelete("SET NULL");
    t.timestamp("approved_at", { useTz: true });
    t.timestamp("published_at", { useTz: true });
    t.timestamp("superseded_at", { useTz: true });
    t.timestamp("withdrawn_at", { useTz: true });
    t.text("withdrawn_reason");
    t.timestamps(true, true);
    t.unique(["sheet_id", "number"]);
  });
  await knex.raw(`alter table sheet_versions add constraint sheet_versions_state_check
    check (state in ('draft','in_review','published','superseded','withdrawn'))`);
  await knex.raw(`alter table sheet_versions add constraint sheet_versions_withdrawn_reason_check
    check (state <> 'withdrawn' or length(coalesce(withdrawn_reason, '')) > 0)`);
  // At most one open draft and one published version per sheet.
  await knex.raw(`create unique index sheet_versions_one_open_draft on sheet_versions (sheet_id)
    where state in ('draft','in_review')`);
  await knex.raw(`create unique index sheet_versions_one_published on sheet_versions (sheet_id)
    where state = 'published'`);
  await knex.raw("create index sheet_versions_vendor_state on sheet_versions (vendor_id, state)");

  // A published version never changes: content columns are frozen and only forward state moves
  // (published -> superseded | withdrawn, superseded -> withdrawn) are allowed, in the database itself.
  await knex.raw(`
    create or replace function sheet_versions_guard() returns trigger language plpgsql as $$
    begin
      if tg_op = 'DELETE' then
        if old.state in ('published','superseded','withdrawn') then
          raise exception 'published sheet versions cannot be deleted' using errcode = 'check_violation';
        end if;
        return old;
      end if;
      if old.state in ('published','superseded','withdrawn') then
        if new.source is distinct from old.source or new.front_matter is distinct from old.front_matter
          or new.title is distinct from old.title or new.number is distinct from old.number
          or new.sheet_id is distinct from old.sheet_id or new.vendor_id is distinct from old.vendor_id
          or new.change_note is distinct from old.change_note or new.author_id is distinct from old.author_id
          or new.approved_by is distinct from old.approved_by or new.published_at is distinct from old.published_at then
          raise exception 'sheet version % is published and immutable', old.id using errcode = 'check_violation';
        end if;
        if not ((old.state = new.state)
          or (old.state = 'published' and new.state in ('superseded','withdrawn'))
          or (old.state = 'superseded' and new.state = 'withdrawn')) then
          raise exception 'sheet version cannot move from % to %', old.state, new.state using errcode = 'check_violation';
        end if;
      end if;
      if new.state = 'published' and old.state <> 'published' and old.state <> 'in_review' then
        raise exception 'only a version in review can be published' using errcode = 'check_violation';
      end if;
      return new;
    end $$;
  `);
  await knex.raw(`create trigger sheet_versions_guard before update or delete on sheet_versions
    for each row execute function sheet_versions_guard()`);
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop trigger if exists sheet_versions_guard on sheet_versions");
  await knex.raw("drop function if exists sheet_versions_guard()");
  for (const table of ["sheet_versions", "sheets", "machine_classes", "materials", "cutters"]) {
    await knex.schema.dropTableIfExists(table);
  }
}
