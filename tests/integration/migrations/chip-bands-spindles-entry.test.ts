import type { Knex } from "knex";
import { beforeAll, describe, expect, it } from "vitest";

import type { MaterialFields } from "@/content-schema/catalogue-material";
import { loadMigration as load, migrationDatabase } from "@/tests/support/migration-db";
import { mustExist } from "@/tests/support/must-exist";

// The migration that added chip-load bands, spindle kinds and entry capability, run over rows written before it,
// in a database of its own (built up to the migration before, so the fill can be seen).
const MIGRATION = "20261202071100_chip_bands_spindles_entry.ts";
const database = migrationDatabase(MIGRATION);
let knex: Knex;
beforeAll(() => {
  knex = database.knex();
});

describe(`migration ${MIGRATION}`, () => {
  it("fills each material's band by group (common practice, from memory), Kienzle constants for metals and Z thrust by rigidity class", async () => {
    const [vendor] = await knex("vendors").insert({ slug: "m-test", name: "Migration test" }).returning("id");
    const material = (slug: string, group: MaterialFields["materialGroup"]) => ({
      vendor_id: vendor.id,
      slug,
      name: slug,
      material_group: group,
      vc_min_mpm: 100,
      vc_max_mpm: 300,
      min_chip_load_mm: 0.02,
      kc_nmm2: 500,
    });
    await knex("materials").insert([
      material("pmma", "plastics"),
      material("oak", "wood"),
      material("al", "non-ferrous"),
      material("cfrp", "composites"),
      material("steel", "ferrous"),
    ]);
    const machineClass = (slug: string, rigidity: number, z: number | null) => ({
      vendor_id: vendor.id,
      slug,
      name: slug,
      rpm_min: 8000,
      rpm_max: 24000,
      power_kw: 1,
      max_feed_mm_min: 5000,
      rigidity,
      z_thrust_n: z,
    });
    await knex("machine_classes").insert([
      machineClass("light", 0.35, null),
      machineClass("medium", 0.7, null),
      machineClass("rigid", 1, null),
      machineClass("known", 0.35, 90),
    ]);

    await (await load(MIGRATION)).up(knex);

    const bands = Object.fromEntries(
      (await knex("materials").select("slug", "chip_load_min_pct_d", "chip_load_max_pct_d", "kc11_nmm2", "mc")).map((r) => [
        r.slug,
        [r.chip_load_min_pct_d, r.chip_load_max_pct_d, r.kc11_nmm2, r.mc],
      ]),
    );
    expect(bands).toEqual({
      pmma: [1.2, 3, null, null],
      oak: [1.2, 3, null, null],
      al: [0.5, 1.5, 500, 0.25],
      cfrp: [0.5, 1.5, null, null],
      steel: [0.3, 1, 1700, 0.25],
    });
    const classes = Object.fromEntries(
      (await knex("machine_classes").select("slug", "z_thrust_n", "spindle_kind", "rated_rpm")).map((r) => [
        r.slug,
        [r.z_thrust_n, r.spindle_kind, r.rated_rpm],
      ]),
    );
    // Rigidity-class defaults: light 150 N, medium 400 N, rigid 1500 N; a known thrust stays.
    expect(classes).toEqual({
      light: [150, "constant-torque", null],
      medium: [400, "constant-torque", null],
      rigid: [1500, "constant-torque", null],
      known: [90, "constant-torque", null],
    });
  });

  it("refuses an upside-down band, mc without kc1.1, a rated speed above the top speed and an unknown entry capability", async () => {
    const vendor = mustExist(await knex("vendors").where({ slug: "m-test" }).first("id"), "vendor");
    const base = {
      vendor_id: vendor.id,
      name: "x",
      material_group: "plastics" as const,
      vc_min_mpm: 100,
      vc_max_mpm: 300,
      min_chip_load_mm: 0.02,
      kc_nmm2: 100,
    };
    await expect(knex("materials").insert({ ...base, slug: "bad-band", chip_load_min_pct_d: 3, chip_load_max_pct_d: 1 })).rejects.toThrow(
      /materials_chip_band_check/,
    );
    await expect(knex("materials").insert({ ...base, slug: "bad-mc", mc: 0.25 })).rejects.toThrow(/materials_kienzle_check/);
    await expect(
      knex("machine_classes").insert({
        vendor_id: vendor.id,
        slug: "fast",
        name: "x",
        rpm_min: 8000,
        rpm_max: 24000,
        power_kw: 1,
        max_feed_mm_min: 5000,
        rigidity: 0.5,
        rated_rpm: 30000,
      }),
    ).rejects.toThrow(/machine_classes_spindle_check/);
    await expect(
      knex.raw(
        "insert into setups (vendor_id, user_id, machine_id, sheet_version_id, result, entry_capability) values (gen_random_uuid(), gen_random_uuid(), gen_random_uuid(), gen_random_uuid(), '{}', 'teleport')",
      ),
    ).rejects.toThrow(/setups_entry_capability_check/);
  });
});
