import type { Knex } from "knex";

// Engine model 2 needs, per material, a chip-load band as a share of the cutter diameter and optional
// Kienzle constants; per machine (customers' and machine classes) the spindle's kind and rated speed and a
// known Z thrust; per setup the customer's CAM entry capability.
//
// Band values by group are typical router ranges (common practice, from memory): plastics and woods
// 1.2–3 % of D, aluminium and composites 0.5–1.5 % of D, ferrous 0.3–1 % of D (from memory). Kienzle
// kc1.1 and mc are from memory, approximate, for metals only: non-ferrous (aluminium alloys) kc1.1 ≈ 500
// N/mm², mc ≈ 0.25; ferrous (unalloyed steel) kc1.1 ≈ 1700 N/mm², mc ≈ 0.25. Plastics, woods and
// composites keep their constant kc (the engine uses it at every chip thickness): no Kienzle values are
// recalled for them with any confidence.
//
// Z thrust left unknown is filled with the default of the machine's rigidity class (light 150 N, medium
// 400 N, rigid 1500 N; invented defaults near common practice). The 0–1 rigidity factor maps to the
// class as the engine does: below 0.45 light, below 0.85 medium, else rigid.
const Z_THRUST_DEFAULT = `case when rigidity < 0.45 then 150 when rigidity < 0.85 then 400 else 1500 end`;

const BAND_MIN = `case material_group when 'plastics' then 1.2 when 'wood' then 1.2 when 'ferrous' then 0.3 else 0.5 end`;
const BAND_MAX = `case material_group when 'plastics' then 3 when 'wood' then 3 when 'ferrous' then 1 else 1.5 end`;

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("materials", (t) => {
    t.double("chip_load_min_pct_d");
    t.double("chip_load_max_pct_d");
    t.double("kc11_nmm2");
    t.double("mc");
  });
  // A row written without a band (an older client, a raw insert) gets its group's band, as the form does
  // (CHIP_BAND_PCT_BY_GROUP in content-schema/catalogue-material.ts holds the same numbers).
  await knex.raw(`create function materials_fill_chip_band() returns trigger language plpgsql as $$
    begin
      new.chip_load_min_pct_d := coalesce(new.chip_load_min_pct_d, ${BAND_MIN.replaceAll("material_group", "new.material_group")});
      new.chip_load_max_pct_d := coalesce(new.chip_load_max_pct_d, ${BAND_MAX.replaceAll("material_group", "new.material_group")});
      return new;
    end $$`);
  await knex.raw(
    `create trigger materials_fill_chip_band before insert or update on materials for each row execute function materials_fill_chip_band()`,
  );
  await knex.raw(`update materials set
    chip_load_min_pct_d = ${BAND_MIN},
    chip_load_max_pct_d = ${BAND_MAX},
    kc11_nmm2 = case material_group when 'non-ferrous' then 500 when 'ferrous' then 1700 end,
    mc = case when material_group in ('non-ferrous', 'ferrous') then 0.25 end`);
  await knex.raw(`alter table materials
    alter column chip_load_min_pct_d set not null,
    alter column chip_load_max_pct_d set not null,
    add constraint materials_chip_band_check check (chip_load_min_pct_d > 0 and chip_load_max_pct_d >= chip_load_min_pct_d and chip_load_max_pct_d <= 20),
    add constraint materials_kienzle_check check ((kc11_nmm2 is null or kc11_nmm2 > 0) and (mc is null or (mc >= 0 and mc < 1)) and (mc is null or kc11_nmm2 is not null))`);

  for (const table of ["machines", "machine_classes"]) {
    await knex.schema.alterTable(table, (t) => {
      t.text("spindle_kind").notNullable().defaultTo("constant-torque");
      t.double("rated_rpm");
    });
    await knex.raw(`update ?? set z_thrust_n = ${Z_THRUST_DEFAULT} where z_thrust_n is null`, [table]);
    await knex.raw(
      `alter table ?? add constraint ?? check (spindle_kind in ('constant-torque','constant-power')
      and (rated_rpm is null or (rated_rpm > 0 and rated_rpm <= rpm_max)) and (z_thrust_n is null or z_thrust_n > 0))`,
      [table, `${table}_spindle_check`],
    );
  }

  await knex.schema.alterTable("setups", (t) => {
    t.text("entry_capability").notNullable().defaultTo("ramp");
  });
  await knex.raw(
    `alter table setups add constraint setups_entry_capability_check check (entry_capability in ('plunge-only','ramp','helix'))`,
  );
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("setups", (t) => t.dropColumn("entry_capability"));
  for (const table of ["machines", "machine_classes"]) {
    await knex.raw(`alter table ?? drop constraint if exists ??`, [table, `${table}_spindle_check`]);
    await knex.schema.alterTable(table, (t) => {
      t.dropColumn("spindle_kind");
      t.dropColumn("rated_rpm");
    });
  }
  await knex.raw(`drop trigger if exists materials_fill_chip_band on materials`);
  await knex.raw(`drop function if exists materials_fill_chip_band()`);
  await knex.raw(
    `alter table materials drop constraint if exists materials_chip_band_check, drop constraint if exists materials_kienzle_check`,
  );
  await knex.schema.alterTable("materials", (t) => {
    t.dropColumn("chip_load_min_pct_d");
    t.dropColumn("chip_load_max_pct_d");
    t.dropColumn("kc11_nmm2");
    t.dropColumn("mc");
  });
}
