// Invented demo data: customers' machines, setups saved from sheet versions, and outcome reports spread
// across versions (so the Field-results rollup has something to show). Numbers come from adaptRecipe.
import type { Knex } from "knex";

import type { OutcomeResult, OutcomeSymptom } from "@/content-schema/outcome-fields";
import { adaptOperation } from "@/lib/adapt/adapt-context";
import { findVersionAdaptContext } from "@/lib/adapt/find-version-adapt-context";

import type { SeededIds } from "./seed-foundation";
import { meltingStorySlug } from "./sheets/demo-sheet-plan";

type MachineSeed = {
  name: string;
  preset: string;
  rpm_min: number;
  rpm_max: number;
  power_kw: number;
  max_feed_mm_min: number;
  rigidity: number;
  z_thrust_n: number | null;
  stickout_mm: number;
  units: "metric" | "imperial";
};

const LIGHT: MachineSeed = {
  name: "Belt-drive desk router",
  preset: "light-trim-router",
  rpm_min: 10000,
  rpm_max: 16000,
  power_kw: 0.8,
  max_feed_mm_min: 3000,
  rigidity: 0.35,
  z_thrust_n: 200,
  stickout_mm: 18,
  units: "metric",
};
const HOBBY: MachineSeed = {
  name: "Garage router, water-cooled spindle",
  preset: "hobby-water-cooled",
  rpm_min: 6000,
  rpm_max: 24000,
  power_kw: 1.5,
  max_feed_mm_min: 5000,
  rigidity: 0.55,
  z_thrust_n: 300,
  stickout_mm: 20,
  units: "imperial",
};
const RIGID: MachineSeed = {
  name: "Ball-screw router, 2.2 kW",
  preset: "rigid-ball-screw",
  rpm_min: 6000,
  rpm_max: 24000,
  power_kw: 2.2,
  max_feed_mm_min: 10000,
  rigidity: 0.75,
  z_thrust_n: 600,
  stickout_mm: 20,
  units: "metric",
};
const VMC: MachineSeed = {
  name: "Small machining centre",
  preset: "small-machining-centre",
  rpm_min: 500,
  rpm_max: 12000,
  power_kw: 5.5,
  max_feed_mm_min: 15000,
  rigidity: 1,
  z_thrust_n: 5000,
  stickout_mm: 30,
  units: "metric",
};

const MACHINES: Record<string, MachineSeed[]> = {
  "maker@example.test": [LIGHT],
  "hobby@example.test": [HOBBY],
  "shop@example.test": [RIGID, VMC],
  "signs@example.test": [LIGHT],
  "cabinets@example.test": [RIGID],
};

type Outcome = { result: OutcomeResult; symptom?: OutcomeSymptom; notes: string; changes?: Record<string, { from: number; to: number }> };

// A plastics sheet whose v1 ran too slow a chip load: it melted on v1 and cut cleanly on v2.
const MELTED: Outcome = { result: "failed", symptom: "melting_welding", notes: "Chips welded to the cutter half way along the slot." };
const CLEAN: Outcome = { result: "worked_as_written", notes: "Clean slot, dry chips." };
const MIXED: Outcome[] = [
  { result: "worked_as_written", notes: "Ran as given." },
  { result: "worked_after_changes", notes: "Lowered the feed a little for a better wall.", changes: {} },
  { result: "failed", symptom: "chatter", notes: "Sang at full depth; fine at half depth." },
  { result: "worked_as_written", notes: "" },
];

const daysAgo = (d: number) => new Date(Date.now() - d * 86_400_000);

export async function seedBench(knex: Knex, ids: SeededIds): Promise<void> {
  for (const [vendorSlug, vendorId] of Object.entries(ids.vendors)) {
    // Without --reset the seed runs again over existing data: add nothing twice.
    if (await knex("setups").where({ vendor_id: vendorId }).first("id")) continue;
    const customers = await knex("members as m")
      .join("users as u", "u.id", "m.user_id")
      .where({ "m.vendor_id": vendorId, "m.role": "customer" })
      .select("u.id", "u.email");
    const machines: { id: string; userId: string; seed: MachineSeed }[] = [];
    for (const c of customers) {
      if (await knex("machines").where({ vendor_id: vendorId, user_id: c.id }).first("id")) continue;
      for (const seed of MACHINES[c.email] ?? [LIGHT]) {
        const [row] = await knex("machines")
          .insert({ vendor_id: vendorId, user_id: c.id, ...seed })
          .returning("id");
        machines.push({ id: row.id, userId: c.id, seed });
      }
    }
    if (!machines.length) continue;
    // Sheets with more than one readable version, plastics first (the melting story needs one).
    const versions = await knex("sheet_versions as v")
      .join("sheets as s", "s.id", "v.sheet_id")
      .join("materials as mt", "mt.id", "s.material_id")
      .where({ "v.vendor_id": vendorId })
      .whereIn("v.state", ["published", "superseded"])
      .orderByRaw("(mt.material_group = 'plastics') desc, s.slug, v.number")
      .select("v.id", "v.number", "v.sheet_id", "s.slug", "mt.material_group");
    const bySheet = new Map<string, typeof versions>();
    for (const v of versions) bySheet.set(v.sheet_id, [...(bySheet.get(v.sheet_id) ?? []), v]);
    const multi = [...bySheet.values()].filter((list) => list.length > 1);
    const meltingSlug = meltingStorySlug(vendorSlug);
    const melting = multi.find((list) => list[0].slug === meltingSlug);
    let turn = 0;
    // The melting story first, so it is always among the sheets with setups.
    for (const list of [...(melting ? [melting] : []), ...multi.filter((l) => l !== melting)].slice(0, 4)) {
      for (const version of list) {
        const context = await findVersionAdaptContext({ vendorId, versionId: version.id, trx: knex });
        if (!context) continue;
        for (let k = 0; k < 3; k++) {
          const machine = machines[turn++ % machines.length];
          let result;
          try {
            result = adaptOperation(context, 0, {
              minRpm: machine.seed.rpm_min,
              maxRpm: machine.seed.rpm_max,
              spindlePowerKw: machine.seed.power_kw,
              maxFeedMmMin: machine.seed.max_feed_mm_min,
              rigidity: machine.seed.rigidity,
              zThrustN: machine.seed.z_thrust_n ?? undefined,
              stickoutMm: machine.seed.stickout_mm,
            });
          } catch {
            continue;
          }
          const created = daysAgo(40 - version.number * 10 - k);
          const [setup] = await knex("setups")
            .insert({
              vendor_id: vendorId,
              user_id: machine.userId,
              machine_id: machine.id,
              sheet_version_id: version.id,
              operation_index: 0,
              name: `${context.title}: ${context.operations[0].label} on ${machine.seed.name}`,
              overrides: "{}",
              result: JSON.stringify(result),
              units: machine.seed.units,
              created_at: created,
              updated_at: created,
            })
            .returning("id");
          // v1 of the melting story rubbed and welded; v2 raised the chip load and cut, and so does its revision.
          const outcome: Outcome = list === melting ? (version.number === 1 ? MELTED : CLEAN) : MIXED[(turn + k) % MIXED.length];
          const changes =
            outcome.result === "worked_after_changes"
              ? { feedMmMin: { from: result.feedMmMin, to: Math.round(result.feedMmMin * 0.85) } }
              : {};
          await knex("outcomes").insert({
            vendor_id: vendorId,
            setup_id: setup.id,
            sheet_version_id: version.id,
            user_id: machine.userId,
            machine_id: machine.id,
            result: outcome.result,
            symptom: outcome.symptom ?? null,
            changes: JSON.stringify(changes),
            notes: outcome.notes,
            created_at: daysAgo(38 - version.number * 10 - k),
          });
        }
      }
    }
  }
}
