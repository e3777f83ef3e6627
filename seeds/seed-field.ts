// Invented demo data for Field results: a few dozen fictional customers with machines, setups and
// outcome reports spread so that every list has content on a fresh start. Nothing here was measured:
// the failure counts, changed numbers, views and machines are made up to tell three stories:
//   - a plastics sheet whose v1 melted and whose v2 fixed it (the intervals do not overlap);
//   - a published sheet that chatters on light machines (it tops Needs attention, with a ticket and a hand-off);
//   - two clusters of customers' machines that no published machine class covers.
import { randomUUID } from "node:crypto";
import type { Knex } from "knex";

import type { OutcomeResult, OutcomeSymptom } from "@/content-schema/outcome-fields";
import { adaptOperation, type AdaptContext } from "@/lib/adapt/adapt-context";
import { findVersionAdaptContext } from "@/lib/adapt/find-version-adapt-context";

import type { SeededIds } from "./seed-foundation";
import { meltingStorySlug } from "./sheets/demo-sheet-plan";

type Archetype = {
  name: string;
  rpm_min: number;
  rpm_max: number;
  power_kw: number;
  max_feed_mm_min: number;
  rigidity: number;
  z_thrust_n: number;
  stickout_mm: number;
  count: number;
};

// Invented machine park, 36 machines per vendor.
const ARCHETYPES: Archetype[] = [
  {
    name: "Desk router with a 12,000 rpm spindle",
    rpm_min: 6000,
    rpm_max: 12000,
    power_kw: 0.5,
    max_feed_mm_min: 2500,
    rigidity: 0.35,
    z_thrust_n: 150,
    stickout_mm: 18,
    count: 8,
  },
  {
    name: "Desk router with a 12,000 rpm spindle (0.8 kW)",
    rpm_min: 6000,
    rpm_max: 12000,
    power_kw: 0.8,
    max_feed_mm_min: 3000,
    rigidity: 0.35,
    z_thrust_n: 150,
    stickout_mm: 18,
    count: 6,
  },
  {
    name: "Trim-router gantry",
    rpm_min: 10000,
    rpm_max: 30000,
    power_kw: 0.6,
    max_feed_mm_min: 4000,
    rigidity: 0.35,
    z_thrust_n: 150,
    stickout_mm: 18,
    count: 8,
  },
  {
    name: "Ball-screw router, 2.2 kW",
    rpm_min: 6000,
    rpm_max: 24000,
    power_kw: 2.2,
    max_feed_mm_min: 10000,
    rigidity: 0.75,
    z_thrust_n: 600,
    stickout_mm: 20,
    count: 8,
  },
  {
    name: "Panel router, 9 kW",
    rpm_min: 6000,
    rpm_max: 24000,
    power_kw: 9,
    max_feed_mm_min: 30000,
    rigidity: 1,
    z_thrust_n: 2000,
    stickout_mm: 25,
    count: 6,
  },
];

type Report = { result: OutcomeResult; symptom?: OutcomeSymptom; changes?: Record<string, number>; notes: string };
const times = (n: number, report: Report): Report[] => Array.from({ length: n }, () => report);

// Relative changes (factor on the adapted number) for "worked after changes" reports.
const MELT_V1: Report[] = [
  ...times(8, { result: "failed", symptom: "melting_welding", notes: "Chips welded back into the slot (invented report)." }),
  { result: "worked_after_changes", changes: { feedMmMin: 1.3 }, notes: "Raised the feed until the chips came off dry (invented)." },
  { result: "worked_after_changes", changes: { feedMmMin: 1.25, rpm: 0.9 }, notes: "More feed, a little less speed (invented)." },
];
const MELT_V2: Report[] = [
  ...times(12, { result: "worked_as_written", notes: "Clean slot, dry chips (invented)." }),
  { result: "worked_after_changes", changes: { feedMmMin: 1.1 }, notes: "A touch more feed on the finishing pass (invented)." },
  { result: "failed", symptom: "poor_finish", notes: "Fuzzy bottom edge with a worn cutter (invented)." },
];
const CHATTER: Report[] = [
  ...times(6, { result: "failed", symptom: "chatter", notes: "Sang at full depth (invented)." }),
  ...times(2, { result: "failed", symptom: "broken_tool", notes: "Snapped on entry (invented)." }),
  { result: "worked_after_changes", changes: { axialDepthMm: 0.5 }, notes: "Half depth, two passes (invented)." },
  { result: "worked_after_changes", changes: { axialDepthMm: 0.6, feedMmMin: 0.85 }, notes: "Shallower and slower (invented)." },
  { result: "worked_after_changes", changes: { axialDepthMm: 0.55 }, notes: "Shallower passes (invented)." },
  { result: "worked_after_changes", changes: { axialDepthMm: 0.65, feedMmMin: 0.8 }, notes: "Shallower and slower (invented)." },
  { result: "worked_after_changes", changes: { axialDepthMm: 0.5 }, notes: "Half depth (invented)." },
  { result: "worked_after_changes", changes: { feedMmMin: 0.8 }, notes: "Less feed (invented)." },
  ...times(4, { result: "worked_as_written", notes: "Fine on a stiff machine (invented)." }),
];
const ONE_OFF: Report[] = [{ result: "failed", symptom: "stalled_lost_steps", notes: "Lost steps on the plunge (invented)." }];
const MOSTLY_FINE: Report[] = [
  ...times(14, { result: "worked_as_written", notes: "Ran as given (invented)." }),
  { result: "worked_after_changes", changes: { feedMmMin: 0.82 }, notes: "Lowered the feed for a better wall (invented)." },
  { result: "worked_after_changes", changes: { feedMmMin: 0.8 }, notes: "Lowered the feed (invented)." },
  { result: "worked_after_changes", changes: { feedMmMin: 0.85 }, notes: "Lowered the feed a little (invented)." },
  { result: "worked_after_changes", changes: { feedMmMin: 0.75, rpm: 0.9 }, notes: "Less feed and speed (invented)." },
  { result: "failed", symptom: "poor_finish", notes: "Fuzzy edges (invented)." },
  { result: "failed", symptom: "chatter", notes: "Chatter on a long stick-out (invented)." },
];

type Machine = { id: string; userId: string; archetype: Archetype };
type Version = { id: string; number: number; sheet_id: string; slug: string; state: string; material_group: string; class_slug: string };

const daysAgo = (d: number) => new Date(Date.now() - d * 86_400_000);

async function createFieldCustomers(knex: Knex, vendorSlug: string, vendorId: string): Promise<Machine[]> {
  const machines: Machine[] = [];
  let n = 0;
  for (const archetype of ARCHETYPES) {
    for (let i = 0; i < archetype.count; i++) {
      n += 1;
      const label = String(n).padStart(2, "0");
      const [user] = await knex("users")
        .insert({ email: `field-${vendorSlug}-${label}@example.test`, name: `Field demo customer ${label} (invented)` })
        .returning("id");
      await knex("members").insert({ vendor_id: vendorId, user_id: user.id, role: "customer" });
      const { count: _count, ...columns } = archetype;
      const [machine] = await knex("machines")
        .insert({ vendor_id: vendorId, user_id: user.id, ...columns, preset: null, units: "metric" })
        .returning("id");
      machines.push({ id: machine.id, userId: user.id, archetype });
    }
  }
  return machines;
}

function adaptFor(context: AdaptContext, m: Archetype) {
  try {
    return adaptOperation(context, 0, {
      minRpm: m.rpm_min,
      maxRpm: m.rpm_max,
      spindlePowerKw: m.power_kw,
      maxFeedMmMin: m.max_feed_mm_min,
      rigidity: m.rigidity,
      zThrustN: m.z_thrust_n,
      stickoutMm: m.stickout_mm,
    });
  } catch {
    return null;
  }
}

const CHANGE_KEYS = {
  rpm: "rpm",
  feedMmMin: "feedMmMin",
  axialDepthMm: "axialDepthMm",
  radialDepthMm: "radialDepthMm",
  plungeFeedMmMin: "plungeFeedMmMin",
} as const;

async function report(knex: Knex, vendorId: string, version: Version, machines: Machine[], reports: Report[], startDay: number) {
  const context = await findVersionAdaptContext({ vendorId, versionId: version.id, trx: knex });
  if (!context?.operations.length) return;
  let turn = 0;
  for (const [k, r] of reports.entries()) {
    // Failures land on the light machines first, as they would; successes on any machine.
    const pool = r.result === "failed" ? machines.filter((m) => m.archetype.rigidity < 0.5) : machines;
    const machine = pool[(turn++ * 7 + k) % pool.length];
    const result = adaptFor(context, machine.archetype);
    if (!result) continue;
    const created = daysAgo(startDay - k * 0.7);
    const [setup] = await knex("setups")
      .insert({
        vendor_id: vendorId,
        user_id: machine.userId,
        machine_id: machine.id,
        sheet_version_id: version.id,
        operation_index: 0,
        name: `${context.title}: ${context.operations[0].label} on ${machine.archetype.name}`,
        overrides: "{}",
        result: JSON.stringify(result),
        units: "metric",
        created_at: created,
        updated_at: created,
      })
      .returning("id");
    const changes = Object.fromEntries(
      Object.entries(r.changes ?? {}).map(([key, factor]) => {
        const from = Number(result[CHANGE_KEYS[key as keyof typeof CHANGE_KEYS]]);
        return [key, { from, to: Math.round(from * factor * 1000) / 1000 }];
      }),
    );
    await knex("outcomes").insert({
      vendor_id: vendorId,
      setup_id: setup.id,
      sheet_version_id: version.id,
      user_id: machine.userId,
      machine_id: machine.id,
      result: r.result,
      symptom: r.symptom ?? null,
      changes: JSON.stringify(changes),
      notes: r.notes,
      created_at: created,
    });
  }
}

async function seedActivity(knex: Knex, vendorId: string, versions: Version[]) {
  const rows = versions.flatMap((v, i) =>
    Array.from({ length: 8 }, (_, week) => {
      const views = 4 + ((i * 37 + week * 11) % 29);
      return {
        vendor_id: vendorId,
        sheet_version_id: v.id,
        day: daysAgo(week * 7 + (i % 7))
          .toISOString()
          .slice(0, 10),
        views,
        adaptations: Math.floor(views * (0.2 + ((i * 13) % 5) / 10)),
      };
    }),
  );
  for (let start = 0; start < rows.length; start += 500)
    await knex("sheet_version_activity")
      .insert(rows.slice(start, start + 500))
      .onConflict(["sheet_version_id", "day"])
      .ignore();
}

async function ticketWithHandoff(knex: Knex, vendorId: string, version: Version, machine: Machine, supportId: string | undefined) {
  const number = ((await knex("tickets").where({ vendor_id: vendorId }).max({ n: "number" }).first())?.n ?? 0) + 1;
  const created = daysAgo(6);
  const [ticket] = await knex("tickets")
    .insert({
      vendor_id: vendorId,
      number,
      customer_id: machine.userId,
      subject: "Chatter and a snapped cutter at the sheet's depth",
      body: "On my desk router the cut sings at full ap and the second cutter snapped on entry. (Invented demo ticket.)",
      status: "in_progress",
      priority: "high",
      assignee_id: supportId ?? null,
      machine_id: machine.id,
      tags: ["chatter"],
      idempotency_key: randomUUID(),
      first_response_due_at: new Date(created.getTime() + 8 * 3_600_000),
      first_response_at: new Date(created.getTime() + 2 * 3_600_000),
      created_at: created,
      updated_at: created,
      last_activity_at: created,
    })
    .returning("id");
  await knex("ticket_sheet_links").insert({
    vendor_id: vendorId,
    ticket_id: ticket.id,
    sheet_version_id: version.id,
    machine_id: machine.id,
  });
  await knex("problem_reports").insert({
    vendor_id: vendorId,
    sheet_version_id: version.id,
    ticket_id: ticket.id,
    reported_by: supportId ?? null,
    summary: "ap too deep for light machines",
    details: "Several customers with light routers report chatter at the sheet's ap; half depth works. (Invented.)",
    created_at: daysAgo(5),
  });
}

export async function seedField(knex: Knex, ids: SeededIds): Promise<void> {
  for (const [vendorSlug, vendorId] of Object.entries(ids.vendors)) {
    // Without --reset the seed runs again over existing data: add nothing twice.
    if (
      await knex("users")
        .where({ email: `field-${vendorSlug}-01@example.test` })
        .first("id")
    )
      continue;
    const machines = await createFieldCustomers(knex, vendorSlug, vendorId);
    const versions: Version[] = await knex("sheet_versions as v")
      .join("sheets as s", "s.id", "v.sheet_id")
      .join("materials as mt", "mt.id", "s.material_id")
      .join("machine_classes as mc", "mc.id", "s.machine_class_id")
      .where({ "v.vendor_id": vendorId })
      .whereIn("v.state", ["published", "superseded"])
      .orderBy(["s.slug", "v.number"])
      .select("v.id", "v.number", "v.sheet_id", "s.slug", "v.state", "mt.material_group", "mc.slug as class_slug");
    await seedActivity(knex, vendorId, versions);
    const bySheet = new Map<string, Version[]>();
    for (const v of versions) bySheet.set(v.sheet_id, [...(bySheet.get(v.sheet_id) ?? []), v]);
    // The same plastics sheet seed-bench tells the melting story with.
    const melting = [...bySheet.values()].find((list) => list[0].slug === meltingStorySlug(vendorSlug));
    if (melting) {
      // v1 melted; v2 raised the chip load and fixed it (its revision, v3, came later and has few reports yet).
      await report(knex, vendorId, melting[0], machines, MELT_V1, 50);
      await report(knex, vendorId, melting[1] ?? melting[0], machines, MELT_V2, 25);
    }
    const published = versions.filter((v) => v.state === "published" && v.sheet_id !== melting?.[0].sheet_id);
    // A hardwood sheet on the light router: full ap chatters on a flexible frame.
    const chatter =
      published.find((v) => v.material_group === "wood" && v.class_slug === "light-router") ??
      published.find((v) => v.material_group !== "plastics") ??
      published[0];
    const rest = published.filter((v) => v !== chatter);
    if (chatter) {
      await report(knex, vendorId, chatter, machines, CHATTER, 30);
      const light = machines.find((m) => m.archetype.rigidity < 0.5)!;
      await ticketWithHandoff(knex, vendorId, chatter, light, ids.users[`support1@${vendorSlug}.test`]);
    }
    if (rest[0]) await report(knex, vendorId, rest[0], machines, ONE_OFF, 3);
    for (const v of rest.slice(1, 4)) await report(knex, vendorId, v, machines, MOSTLY_FINE, 40);
  }
}
