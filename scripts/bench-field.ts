// Benchmark of Field results (Drafting › Field results and its per-sheet drill-in) at production scale.
// It creates a throwaway database in the local cluster (never the dev database), migrates it and seeds it
// set-based (insert … select … from generate_series) with customers, ~50,000 machines built from a few
// archetypes, setups, 1,000,000 outcome reports over 20,000 sheet versions (some sheets have a superseded
// v1 and a published v2), daily view/adaptation counters and a few tickets and hand-offs. Failure rates vary
// by version, so the needs-attention ranking has real work to do. The load runs in one transaction with the
// foreign-key triggers skipped (superuser only) and the big tables' secondary indexes rebuilt afterwards, the
// usual bulk-load tricks; the schema the queries see is exactly the migrated one. It then measures:
//   · the full rebuild of both rollup tables, then refreshFieldRollups() after one new outcome report (the
//     job's usual case: only the touched version is recomputed, so it should not grow with the total);
//   · each Field-results query on its own, p50/p95/p99 (sequential, round-robin over vendors);
//   · the overview page load: its four queries in parallel, as the page runs them;
//   · the drill-in, loadSheetFieldResults(), for random sheets;
//   · EXPLAIN ANALYZE of the needs-attention query and the execution time of every query the pages issue.
// Each measured phase stops after --iterations runs or PHASE_BUDGET_MS, whichever comes first.
// The database is always dropped at the end.
// Run: npm run bench:field -- [--outcomes 1000000] [--versions 20000] [--vendors 20] [--machines 50000] [--iterations 200]
// Only the refresh figures, at several sizes (one throwaway database each): npm run bench:field -- --refresh-at 1000000,5000000
import type { Knex } from "knex";
import pg from "pg";

import { CHANGEABLE_PARAMS, type ChangeableParam, OUTCOME_SYMPTOMS } from "../content-schema/outcome-fields";

import { createBenchVendor } from "./bench-search-data";
import { arg, percentile } from "./lib/bench-args";
import { withBenchDatabase } from "./lib/bench-database";
import { prng } from "./lib/prng";

const TARGET_P95_MS = 200;
/** z for a two-sided 95 % interval, the vendors' default confidence. */
const Z = 1.959964;
/** Each measured phase stops after this long, whatever --iterations says. */
const PHASE_BUDGET_MS = 60_000;
/** Share of sheets that also have a v2 (their v1 is superseded). */
const SECOND_VERSION_SHARE = 0.15;
const SETUPS_PER_OUTCOME = 0.6;
const MACHINES_PER_CUSTOMER = 2.5;
/** Versions beyond this share of each vendor's (random) order get no setups and so no reports. */
const REPORTED_SHARE = 0.9;
const ACTIVITY_DAYS = 30;
const TICKETS_PER_VENDOR = 100;

// The three machine classes createBenchVendor creates, given distinct reference machines.
const CLASS_SPECS = [
  // slug, rpm_min, rpm_max, power kW, max feed mm/min, rigidity
  ["light-router", 10_000, 30_000, 0.8, 5_000, 0.35],
  ["rigid-router", 6_000, 24_000, 2.2, 10_000, 0.7],
  ["vmc", 1_000, 10_000, 5.5, 12_000, 1],
] as const;

// Customers' machines: each is one archetype with jitter, rounded as people type numbers in.
const MACHINE_ARCHETYPES = [
  // preset, share, rpm_min, rpm_max, power kW, max feed mm/min, rigidity
  ["desktop-mini", 0.12, 1_000, 10_000, 0.3, 1_000, 0.25],
  ["trim-router-belt", 0.25, 10_000, 30_000, 0.7, 5_000, 0.35],
  ["hobby-ballscrew-1.5kw", 0.2, 8_000, 24_000, 1.5, 6_000, 0.55],
  ["hobby-ballscrew-2.2kw", 0.18, 6_000, 24_000, 2.2, 8_000, 0.65],
  ["pro-router-atc", 0.1, 6_000, 24_000, 9, 20_000, 0.9],
  ["small-vmc", 0.05, 500, 10_000, 5.5, 12_000, 1],
  ["hf-engraver", 0.1, 18_000, 60_000, 0.8, 6_000, 0.5],
] as const;

/** Typical value of each parameter a customer may change, and the step people round it to. */
const CHANGE_PARAMS: Record<ChangeableParam, { base: number; step: number }> = {
  rpm: { base: 18_000, step: 100 },
  feedMmMin: { base: 1_800, step: 10 },
  axialDepthMm: { base: 3, step: 0.1 },
  radialDepthMm: { base: 2, step: 0.1 },
  plungeFeedMmMin: { base: 600, step: 10 },
};

type Options = { outcomes: number; versions: number; vendors: number; machines: number; iterations: number };
type SheetPick = { vendorId: string; sheetId: string; versions: number };
type Samples = Map<string, number[]>;

// ── Command line ───────────────────────────────────────────────────────────────────────────────────

function readOptions(): Options {
  const vendors = arg("vendors", 20, 100);
  return {
    vendors,
    versions: arg("versions", 20_000, 200_000, vendors),
    machines: arg("machines", 50_000, 500_000, vendors),
    outcomes: arg("outcomes", 1_000_000, 5_000_000, vendors),
    iterations: arg("iterations", 200, 5_000),
  };
}

// ── Small helpers ──────────────────────────────────────────────────────────────────────────────────

const fmt = (ms: number) => (ms >= 10_000 ? `${(ms / 1000).toFixed(1)} s` : `${Math.round(ms)} ms`);

/** `(?::text, ?::float8), (…)` and its bindings, for a VALUES list built from a constant table. */
function valuesList(rows: readonly (readonly (string | number)[])[], types: readonly string[]) {
  return { sql: rows.map(() => `(${types.map((t) => `?::${t}`).join(", ")})`).join(", "), bindings: rows.flat() };
}

/** Splits `total` into `parts` counts that differ by at most one. */
const split = (total: number, parts: number) => Array.from({ length: parts }, (_, i) => Math.floor(total / parts) + (i < total % parts ? 1 : 0));

async function step(label: string, run: () => Promise<number | null | void>) {
  const started = performance.now();
  const rows = await run();
  console.log(`  ${label.padEnd(44)} ${(typeof rows === "number" ? rows.toLocaleString("en-GB") : "").padStart(10)}  ${fmt(performance.now() - started).padStart(8)}`);
}

const rowCount = async (query: Promise<{ rowCount: number | null }>) => (await query).rowCount;
const countRows = async (knex: Knex, table: string) => (await knex.raw<{ rows: { n: number }[] }>(`select count(*)::int as n from ${table}`)).rows[0].n;

// ── Seeding: catalogue and sheet versions ──────────────────────────────────────────────────────────

/** Supersedes `count` random published v1s of a vendor and publishes a v2 for each (the guard trigger allows published → superseded). */
async function addSecondVersions(knex: Knex, vendorId: string, count: number) {
  await knex.raw(
    `update sheet_versions set state = 'superseded', superseded_at = published_at + interval '30 days'
     where id in (select id from sheet_versions where vendor_id = ? and state = 'published' order by md5(id::text) limit ?)`,
    [vendorId, count],
  );
  await knex.raw(
    `insert into sheet_versions (vendor_id, sheet_id, number, state, title, source, front_matter, change_note, published_at)
     select vendor_id, sheet_id, number + 1, 'published', title, source || ?, front_matter, ?, superseded_at
     from sheet_versions where vendor_id = ? and state = 'superseded'`,
    ["\n## Changes\n\nFeeds lowered after field reports.\n", "Feeds lowered after field reports.", vendorId],
  );
}

/** createBenchVendor per vendor (catalogue, sheets, a published v1 each), then the v2s; `versions` in total. */
async function seedCatalogue(knex: Knex, o: Options) {
  for (const [i, versions] of split(o.versions, o.vendors).entries()) {
    const sheets = Math.max(1, Math.round(versions / (1 + SECOND_VERSION_SHARE)));
    const vendor = await createBenchVendor(knex, i, sheets);
    if (versions > sheets) await addSecondVersions(knex, vendor.id, versions - sheets);
  }
  const classes = valuesList(CLASS_SPECS, ["text", "float8", "float8", "float8", "float8", "float8"]);
  await knex.raw(
    `update machine_classes mc set rpm_min = c.rpm_min, rpm_max = c.rpm_max, power_kw = c.power_kw, max_feed_mm_min = c.max_feed, rigidity = c.rigidity
     from (values ${classes.sql}) as c(slug, rpm_min, rpm_max, power_kw, max_feed, rigidity) where mc.slug = c.slug`,
    classes.bindings,
  );
  return countRows(knex, "sheet_versions");
}

// ── Seeding: field data (one transaction; temp tables map each vendor's rows to 0-based indexes) ─────

async function seedVendorIndex(trx: Knex.Transaction) {
  await trx.raw(`create temp table bench_vendor on commit drop as
    select (row_number() over (order by slug))::int - 1 as idx, id from vendors`);
}

/** Customers: users with a 'customer' membership, spread round-robin over the vendors. */
async function seedCustomers(trx: Knex.Transaction, o: Options) {
  const customers = Math.max(o.vendors, Math.round(o.machines / MACHINES_PER_CUSTOMER));
  await trx.raw(
    `create temp table bench_customer on commit drop as
     select g % ?::int as vendor_idx, g / ?::int as k, g, gen_random_uuid() as user_id from generate_series(0, ?::int - 1) g`,
    [o.vendors, o.vendors, customers],
  );
  await trx.raw("analyze bench_customer");
  await trx.raw(`insert into users (id, email, name, email_verified)
    select user_id, 'bench-customer-' || g || '@example.test', 'Bench customer ' || g, now() from bench_customer`);
  return rowCount(trx.raw(`insert into members (vendor_id, user_id, role)
    select v.id, c.user_id, 'customer' from bench_customer c join bench_vendor v on v.idx = c.vendor_idx`));
}

/** Machines: an archetype each (by share), with jitter, rounded: rpm to 1000, kW to 0.1, rigidity to 0.05. */
async function seedMachines(trx: Knex.Transaction, o: Options) {
  const total = MACHINE_ARCHETYPES.reduce((s, a) => s + a[1], 0);
  let seen = 0;
  const bands = MACHINE_ARCHETYPES.map(([preset, share, ...spec], i) => {
    const lo = seen / total;
    seen += share;
    return [preset, lo, i === MACHINE_ARCHETYPES.length - 1 ? 2 : seen / total, ...spec] as const;
  });
  const archetypes = valuesList(bands, ["text", "float8", "float8", "float8", "float8", "float8", "float8", "float8"]);
  await trx.raw(
    `create temp table bench_machine on commit drop as
     select p.vendor_idx, p.k, gen_random_uuid() as id, c.user_id, a.preset, j.rpm_min,
       greatest(j.rpm_min, round(a.rpm_max * (0.85 + 0.3 * p.r2) / 1000) * 1000) as rpm_max,
       greatest(0.1, round((a.power_kw * (0.75 + 0.5 * p.r3))::numeric, 1))::float8 as power_kw,
       a.max_feed as max_feed_mm_min,
       least(1, greatest(0.05, round(((a.rigidity + 0.2 * (p.r4 - 0.5)) / 0.05)::numeric) * 0.05))::float8 as rigidity
     from (select g % ?::int as vendor_idx, g / ?::int as k, random() as ra, random() as r1, random() as r2, random() as r3, random() as r4
           from generate_series(0, ?::int - 1) g) p
     join (values ${archetypes.sql}) as a(preset, lo, hi, rpm_min, rpm_max, power_kw, max_feed, rigidity) on p.ra >= a.lo and p.ra < a.hi
     join (select vendor_idx, count(*)::int as n from bench_customer group by 1) cc on cc.vendor_idx = p.vendor_idx
     join bench_customer c on c.vendor_idx = p.vendor_idx and c.k = p.k % cc.n
     cross join lateral (select greatest(1000, round(a.rpm_min * (0.85 + 0.3 * p.r1) / 1000) * 1000) as rpm_min) j`,
    [o.vendors, o.vendors, o.machines, ...archetypes.bindings],
  );
  await trx.raw("analyze bench_machine");
  return rowCount(trx.raw(`insert into machines (id, vendor_id, user_id, name, preset, rpm_min, rpm_max, power_kw, max_feed_mm_min, rigidity)
    select m.id, v.id, m.user_id, 'Bench machine ' || m.k, m.preset, m.rpm_min, m.rpm_max, m.power_kw, m.max_feed_mm_min, m.rigidity
    from bench_machine m join bench_vendor v on v.idx = m.vendor_idx`));
}

/**
 * Per version: a random place in its vendor's popularity order (k, rank01) and how it fares in the field —
 * a superseded v1 fails often and its v2 rarely, ~8 % of the other versions are troubled — plus its most common
 * symptom, the parameter customers change most and by what factor.
 */
async function seedVersionProfiles(trx: Knex.Transaction) {
  await trx.raw(
    `create temp table bench_version on commit drop as
     select bv.idx as vendor_idx, (row_number() over w)::int - 1 as k, percent_rank() over w as rank01,
       x.id, x.sheet_id, x.number, x.state,
       case when x.state = 'superseded' then 0.15 + 0.3 * x.r1
            when x.number > 1 then 0.01 + 0.05 * x.r1
            when x.r2 < 0.08 then 0.12 + 0.3 * x.r1
            else 0.005 + 0.08 * x.r1 * x.r1 end as fail_rate,
       0.05 + 0.25 * x.r3 as change_rate,
       floor(x.r4 * ?::int)::int as symptom_idx,
       floor(x.r5 * ?::int)::int as param_idx,
       case when x.r6 < 0.2 then 1.05 + 0.3 * x.r7 else 0.7 + 0.25 * x.r7 end as factor
     from (select v.id, v.vendor_id, v.sheet_id, v.number, v.state, random() as r0, random() as r1, random() as r2, random() as r3,
             random() as r4, random() as r5, random() as r6, random() as r7 from sheet_versions v) x
     join bench_vendor bv on bv.id = x.vendor_id
     window w as (partition by bv.idx order by x.r0)`,
    [OUTCOME_SYMPTOMS.length, CHANGEABLE_PARAMS.length],
  );
  await trx.raw("analyze bench_version");
}

/** Setups: a vendor round-robin, a version skewed to the popular ones (k ~ n·u²), a random machine of the vendor. */
async function seedSetups(trx: Knex.Transaction, o: Options) {
  const setups = Math.max(o.vendors, Math.round(o.outcomes * SETUPS_PER_OUTCOME));
  await trx.raw(
    `create temp table bench_setup on commit drop as
     with pick as (
       select g, g % ?::int as vendor_idx, random() as rv, random() as rm, random() as rt from generate_series(0, ?::int - 1) g
     ), sized as (
       select p.*, floor(?::float8 * vc.n * p.rv * p.rv)::int as version_k, floor(mc.n * p.rm)::int as machine_k
       from pick p
       join (select vendor_idx, count(*)::int as n from bench_version group by 1) vc on vc.vendor_idx = p.vendor_idx
       join (select vendor_idx, count(*)::int as n from bench_machine group by 1) mc on mc.vendor_idx = p.vendor_idx
     )
     select (row_number() over ())::int - 1 as k, gen_random_uuid() as id, bv.id as vendor_id, m.user_id, m.id as machine_id,
       v.id as version_id, v.fail_rate, v.change_rate, v.symptom_idx, v.param_idx, v.factor, now() - interval '180 days' * s.rt as created_at
     from sized s
     join bench_vendor bv on bv.idx = s.vendor_idx
     join bench_version v on v.vendor_idx = s.vendor_idx and v.k = s.version_k
     join bench_machine m on m.vendor_idx = s.vendor_idx and m.k = s.machine_k`,
    [o.vendors, setups, REPORTED_SHARE],
  );
  await trx.raw("analyze bench_setup");
  return rowCount(trx.raw(`insert into setups (id, vendor_id, user_id, machine_id, sheet_version_id, result, created_at, updated_at)
    select id, vendor_id, user_id, machine_id, version_id, '{}'::jsonb, created_at, created_at from bench_setup order by id`));
}

/**
 * Outcomes on random setups: failed with the version's failure rate (its usual symptom 60 % of the time),
 * worked after changes with its change rate (its usual parameter 70 % of the time, by its factor; a second
 * parameter backed off in 30 % of those reports), else worked as written.
 */
async function seedOutcomes(trx: Knex.Transaction, o: Options) {
  const setups = await countRows(trx, "bench_setup");
  const params = CHANGEABLE_PARAMS.map((p) => [p, CHANGE_PARAMS[p].base, CHANGE_PARAMS[p].step] as const);
  const change = (idx: string, from: string, to: string) =>
    `jsonb_build_object(k.params[${idx} + 1], jsonb_build_object(
       'from', ${from}, 'to', greatest(k.steps[${idx} + 1], round(${to} / k.steps[${idx} + 1]) * k.steps[${idx} + 1])))`;
  const fromValue = (idx: string, u: string) => `greatest(k.steps[${idx} + 1], round((k.bases[${idx} + 1] * (0.6 + 0.8 * ${u}))::numeric / k.steps[${idx} + 1]) * k.steps[${idx} + 1])`;
  return rowCount(
    trx.raw(
      `insert into outcomes (vendor_id, setup_id, sheet_version_id, user_id, machine_id, result, symptom, changes, created_at)
       select s.vendor_id, s.id, s.version_id, s.user_id, s.machine_id, r.result,
         case when r.result = 'failed' then k.symptoms[1 + case when o.rs < 0.6 then s.symptom_idx else floor((o.rs - 0.6) / 0.4 * k.n_symptoms)::int end] end,
         case when r.result <> 'worked_after_changes' then '{}'::jsonb
              when o.r2 >= 0.3 then ${change("c.primary_idx", "c.primary_from", "c.primary_from * (s.factor * (0.95 + 0.1 * o.r2))::numeric")}
              else ${change("c.primary_idx", "c.primary_from", "c.primary_from * (s.factor * (0.95 + 0.1 * o.r2))::numeric")}
                || ${change("c.second_idx", "c.second_from", "c.second_from * (0.8 + 0.15 * o.rs)::numeric")} end,
         least(now(), s.created_at + interval '14 days' * o.rd)
       from (select floor(random() * ?::int)::int as setup_k, random() as ru, random() as rs, random() as rp, random() as rf, random() as r2, random() as rd
             from generate_series(1, ?::int) g) o
       cross join (select ?::text[] as symptoms, ?::int as n_symptoms, ?::text[] as params, ?::numeric[] as bases, ?::numeric[] as steps, ?::int as n_params) k
       join bench_setup s on s.k = o.setup_k
       cross join lateral (select case when o.ru < s.fail_rate then 'failed' when o.ru < s.fail_rate + s.change_rate then 'worked_after_changes'
                                  else 'worked_as_written' end as result) r
       cross join lateral (select case when o.rp < 0.7 then s.param_idx else floor((o.rp - 0.7) / 0.3 * k.n_params)::int end as primary_idx) ci
       cross join lateral (select ci.primary_idx, (ci.primary_idx + 1 + floor(o.r2 / 0.3 * (k.n_params - 1))::int) % k.n_params as second_idx) cj
       cross join lateral (select cj.primary_idx, cj.second_idx, ${fromValue("cj.primary_idx", "o.rf")} as primary_from,
                                  ${fromValue("cj.second_idx", "o.rd")} as second_from) c`,
      [
        setups,
        o.outcomes,
        [...OUTCOME_SYMPTOMS],
        OUTCOME_SYMPTOMS.length,
        params.map((p) => p[0]),
        params.map((p) => p[1]),
        params.map((p) => p[2]),
        params.length,
      ],
    ),
  );
}

/** Daily counters for the last ACTIVITY_DAYS days: popular versions are viewed on more days and more often. */
async function seedActivity(trx: Knex.Transaction) {
  return rowCount(
    trx.raw(
      `insert into sheet_version_activity (vendor_id, sheet_version_id, day, views, adaptations)
       select x.vendor_id, x.id, current_date - x.d, x.views, floor(x.views * 0.4 * x.r2)::int
       from (select bv.id as vendor_id, v.id, d, 1 - v.rank01 as pop, random() as r1, random() as r2,
               1 + floor(random() * 40 * (1 - v.rank01))::int as views
             from bench_version v join bench_vendor bv on bv.idx = v.vendor_idx cross join generate_series(0, ?::int - 1) d) x
       where x.r1 < 0.05 + 0.5 * x.pop`,
      [ACTIVITY_DAYS],
    ),
  );
}

/** Per vendor: tickets about its worst versions, each linked to that version; every third one handed off to engineering. */
async function seedTickets(trx: Knex.Transaction) {
  await trx.raw(
    `create temp table bench_ticket on commit drop as
     select gen_random_uuid() as id, bv.id as vendor_id, t.n as number, t.version_id, c.user_id as customer_id
     from (select vendor_idx, id as version_id, (row_number() over (partition by vendor_idx order by fail_rate desc, k))::int as n
           from bench_version where fail_rate >= 0.12) t
     join bench_vendor bv on bv.idx = t.vendor_idx
     join (select vendor_idx, count(*)::int as n from bench_customer group by 1) cc on cc.vendor_idx = t.vendor_idx
     join bench_customer c on c.vendor_idx = t.vendor_idx and c.k = (t.n * 7) % cc.n
     where t.n <= ?::int`,
    [TICKETS_PER_VENDOR],
  );
  const tickets = await rowCount(
    trx.raw(`insert into tickets (id, vendor_id, number, customer_id, subject, body, status, idempotency_key, first_response_due_at, created_at, last_activity_at)
      select id, vendor_id, number, customer_id, 'Bench ticket ' || number, 'Invented bench ticket about a cut that went wrong.',
        (array['new', 'in_progress', 'answered', 'closed'])[1 + number % 4], 'bench-' || number,
        now() + interval '1 day', now() - interval '1 day' * (number % 60), now() - interval '1 day' * (number % 60)
      from bench_ticket`),
  );
  await trx.raw("insert into ticket_sheet_links (vendor_id, ticket_id, sheet_version_id) select vendor_id, id, version_id from bench_ticket");
  await trx.raw(`insert into problem_reports (vendor_id, sheet_version_id, ticket_id, summary, status)
    select vendor_id, version_id, id, 'Bench hand-off for ticket ' || number, case when number % 2 = 0 then 'open' else 'resolved' end
    from bench_ticket where number % 3 = 0`);
  return tickets;
}

/**
 * Bulk-load trick: drops the table's secondary indexes (not those behind a constraint), runs `load`, and builds
 * them again from their own definitions; one sorted build is far cheaper than a million random B-tree inserts.
 */
async function withIndexesRebuiltAfter<T>(trx: Knex.Transaction, table: string, load: () => Promise<T>): Promise<T> {
  const { rows } = await trx.raw<{ rows: { name: string; definition: string }[] }>(
    `select c.relname as name, pg_get_indexdef(c.oid) as definition
     from pg_index i join pg_class c on c.oid = i.indexrelid
     where i.indrelid = ?::regclass and not exists (select 1 from pg_constraint k where k.conindid = c.oid)`,
    [table],
  );
  for (const index of rows) await trx.raw("drop index ??", [index.name]);
  const result = await load();
  for (const index of rows) await trx.raw(index.definition);
  return result;
}

/**
 * A superuser skips the foreign-key triggers for the bulk load (session_replication_role = replica, this
 * transaction only). Safe here: every seeded row is built by joining rows that exist, so no reference can dangle.
 */
async function skipTriggersIfAllowed(trx: Knex.Transaction) {
  const { rows } = await trx.raw<{ rows: { superuser: boolean }[] }>("select rolsuper as superuser from pg_roles where rolname = current_user");
  if (rows[0]?.superuser) await trx.raw("set local session_replication_role = replica");
  else console.log("  (not a superuser: foreign-key checks stay on, seeding is slower)");
}

async function seedFieldData(knex: Knex, o: Options) {
  await knex.transaction(async (trx) => {
    await trx.raw("select setseed(0.2026)");
    await trx.raw("set local work_mem = '256MB'");
    await trx.raw("set local temp_buffers = '256MB'"); // before the first temp table of this session
    await skipTriggersIfAllowed(trx);
    await seedVendorIndex(trx);
    await step("customers (users + members)", () => seedCustomers(trx, o));
    await step("machines", () => seedMachines(trx, o));
    await seedVersionProfiles(trx);
    await step("setups", () => withIndexesRebuiltAfter(trx, "setups", () => seedSetups(trx, o)));
    await step("outcomes", () => withIndexesRebuiltAfter(trx, "outcomes", () => seedOutcomes(trx, o)));
    await step("sheet_version_activity", () => withIndexesRebuiltAfter(trx, "sheet_version_activity", () => seedActivity(trx)));
    await step("tickets (+ links, hand-offs)", () => seedTickets(trx));
  });
}

async function seed(knex: Knex, o: Options) {
  const started = performance.now();
  console.log("seeding:");
  await step("sheet versions (createBenchVendor + v2s)", () => seedCatalogue(knex, o));
  await seedFieldData(knex, o);
  await step("vacuum analyze", () => knex.raw("vacuum analyze"));
  console.log(`seeding took ${fmt(performance.now() - started)}`);
}

async function printDataShape(knex: Knex) {
  const { rows } = await knex.raw<{ rows: Record<string, number>[] }>(`
    select (select count(*) from sheet_versions where state = 'published')::int as published,
      (select count(*) from sheet_versions where state = 'superseded')::int as superseded,
      (select count(*) from field_version_rollups where outcomes > 0)::int as versions_with_reports,
      (select count(*) from field_version_rollups where state = 'published' and failed > 0)::int as published_with_failures,
      (select round(100.0 * sum(failed) / nullif(sum(outcomes), 0), 1)::float8 from field_version_rollups) as failed_pct,
      (select count(*) from field_change_rollups)::int as change_rollups,
      (select count(distinct (rpm_min, rpm_max, power_kw, rigidity)) from machines)::int as machine_groups`);
  const r = rows[0];
  console.log(`data: ${r.published} published + ${r.superseded} superseded versions; ${r.versions_with_reports} with reports, ${r.published_with_failures} published with failures; ` +
    `${r.failed_pct} % of reports failed; ${r.change_rollups} change rollup rows; ${r.machine_groups} distinct machine specs`);
}

// ── The code under test, loaded against the bench database ─────────────────────────────────────────

/** lib/db/knex reads DATABASE_URL when it is first imported, so set it before importing anything that uses it. */
async function loadFieldModules(databaseUrl: string) {
  process.env.DATABASE_URL = databaseUrl;
  process.env.JOBS_WORKER = "off";
  const [{ db }, refresh, summary, attention, changes, coverage, sheet] = await Promise.all([
    import("../lib/db/knex"),
    import("../lib/field/refresh-rollups"),
    import("../lib/field/field-summary"),
    import("../lib/field/needs-attention"),
    import("../lib/field/customer-changes"),
    import("../lib/field/coverage"),
    import("../lib/field/sheet-field-results"),
  ]);
  const overview: Record<string, (vendorId: string) => Promise<unknown>> = {
    loadFieldSummary: (vendorId) => summary.loadFieldSummary({ vendorId }),
    listNeedsAttention: (vendorId) => attention.listNeedsAttention({ vendorId, z: Z, limit: 25 }),
    listCustomerChanges: (vendorId) => changes.listCustomerChanges({ vendorId, limit: 25 }),
    loadCoverageGaps: (vendorId) => coverage.loadCoverageGaps({ vendorId }),
  };
  const drillIn = (pick: SheetPick) => sheet.loadSheetFieldResults({ vendorId: pick.vendorId, sheetId: pick.sheetId, z: Z });
  return { db, refreshFieldRollups: refresh.refreshFieldRollups, overview, drillIn };
}
type Field = Awaited<ReturnType<typeof loadFieldModules>>;

// ── Measurement ────────────────────────────────────────────────────────────────────────────────────

async function timeIt(samples: Samples, name: string, run: () => Promise<unknown>) {
  const started = performance.now();
  await run();
  const ms = performance.now() - started;
  if (!samples.has(name)) samples.set(name, []);
  samples.get(name)!.push(ms);
  return ms;
}

/** Runs `body(i)` up to `iterations` times or until the phase budget is spent. */
async function phase(iterations: number, body: (i: number) => Promise<void>) {
  const deadline = performance.now() + PHASE_BUDGET_MS;
  for (let i = 0; i < iterations && performance.now() < deadline; i++) await body(i);
}

async function loadDrillInSheets(knex: Knex, count: number): Promise<SheetPick[]> {
  const { rows } = await knex.raw<{ rows: { vendor_id: string; sheet_id: string; versions: number }[] }>(
    "select vendor_id, sheet_id, count(*)::int as versions from sheet_versions group by 1, 2 order by md5(sheet_id::text) limit ?",
    [Math.max(2_000, count * 4)],
  );
  const all = rows.map((r) => ({ vendorId: r.vendor_id, sheetId: r.sheet_id, versions: r.versions }));
  const several = all.filter((s) => s.versions > 1);
  // Half of the drill-ins open a sheet with several versions, the page's heavier case.
  const random = prng(0xf1e1d);
  return Array.from({ length: count }, (_, i) => {
    const list = i % 2 === 0 && several.length ? several : all;
    return list[Math.floor(random() * list.length)];
  });
}

async function measure(field: Field, vendorIds: string[], sheets: SheetPick[], iterations: number) {
  const names = Object.keys(field.overview);
  // Rows of the table in this order, whichever query finishes first.
  const samples: Samples = new Map([...names.map((n) => `alone   ${n}`), ...names.map((n) => `in page ${n}`)].map((key) => [key, []]));
  for (const vendorId of vendorIds) await Promise.all(names.map((n) => field.overview[n](vendorId))); // warm-up
  for (const pick of sheets.slice(0, 10)) await field.drillIn(pick);

  await phase(iterations, async (i) => {
    for (const n of names) await timeIt(samples, `alone   ${n}`, () => field.overview[n](vendorIds[i % vendorIds.length]));
  });
  await phase(iterations, async (i) => {
    const vendorId = vendorIds[i % vendorIds.length];
    await timeIt(samples, "page    overview (all four in parallel)", () => Promise.all(names.map((n) => timeIt(samples, `in page ${n}`, () => field.overview[n](vendorId)))));
  });
  await phase(iterations, async (i) => {
    await timeIt(samples, "page    drill-in loadSheetFieldResults", () => field.drillIn(sheets[i % sheets.length]));
  });
  return samples;
}

function printTable(samples: Samples) {
  console.log(`\n${"".padEnd(48)}${["n", "p50", "p95", "p99", "max"].map((h) => h.padStart(8)).join("")}   (ms)`);
  const stats = new Map<string, number>();
  for (const [name, ms] of samples) {
    const sorted = [...ms].sort((a, b) => a - b);
    const [p50, p95, p99] = [50, 95, 99].map((p) => percentile(sorted, p));
    stats.set(name, p95);
    console.log(`${name.padEnd(48)}${String(sorted.length).padStart(8)}${[p50, p95, p99, sorted.at(-1)!].map((v) => v.toFixed(1).padStart(8)).join("")}`);
  }
  return stats;
}

// ── Plans ──────────────────────────────────────────────────────────────────────────────────────────

type Captured = { sql: string; bindings: unknown[] };

/** The SQL (native $n form) and bindings of every query `run` sends through the app's pool. */
async function captureQueries(db: Knex, run: () => Promise<unknown>): Promise<Captured[]> {
  const captured: Captured[] = [];
  const listener = (q: { sql: string; bindings?: unknown[] }) => captured.push({ sql: q.sql, bindings: q.bindings ?? [] });
  db.on("query", listener);
  try {
    await run();
  } finally {
    db.removeListener("query", listener);
  }
  return captured;
}

async function explain(client: pg.Client, q: Captured, options = "analyze") {
  const { rows } = await client.query<{ "QUERY PLAN": string }>(`explain (${options}) ${q.sql}`, q.bindings);
  return rows.map((r) => r["QUERY PLAN"]);
}

async function printPlans(url: string, field: Field, vendorId: string, sheet: SheetPick) {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    const attention = await captureQueries(field.db, () => field.overview.listNeedsAttention(vendorId));
    const ranking = attention.find((q) => q.sql.includes("lower_bound"));
    if (ranking) {
      console.log("\nEXPLAIN (ANALYZE, BUFFERS) of the needs-attention query:");
      console.log((await explain(client, ranking, "analyze, buffers")).join("\n"));
    }
    console.log("\nPostgreSQL execution/planning time of every query the pages send:");
    const pages: [string, () => Promise<unknown>][] = [
      ...Object.entries(field.overview).map(([n, run]) => [n, () => run(vendorId)] as [string, () => Promise<unknown>]),
      ["loadSheetFieldResults", () => field.drillIn(sheet)],
    ];
    for (const [name, run] of pages) {
      for (const q of await captureQueries(field.db, run)) {
        const plan = await explain(client, q);
        const ms = (label: string) => plan.find((line) => line.startsWith(label))?.replace(/[^\d.]/g, "") ?? "?";
        console.log(`  exec ${ms("Execution Time").padStart(8)} ms  plan ${ms("Planning Time").padStart(6)} ms  ${name}: ${q.sql.replace(/\s+/g, " ").slice(0, 90)}…`);
      }
    }
  } finally {
    await client.end();
  }
}

// ── Main ───────────────────────────────────────────────────────────────────────────────────────────

type RefreshFigures = { outcomes: number; rebuildMs: number; oneReportMs: number };
const ONE_REPORT_RUNS = 5;

/**
 * The bulk load ran with triggers off, so the rollups start with a full rebuild (what every refresh cost
 * before); then, ONE_REPORT_RUNS times, one new outcome report on a random version and the refresh the job runs.
 */
async function measureRefresh(knex: Knex, field: Field, outcomes: number): Promise<RefreshFigures> {
  const rebuilt = await field.refreshFieldRollups(knex, { rebuild: true });
  console.log(`full rebuild of both rollups: ${fmt(rebuilt.durationMs)} (${rebuilt.versions.toLocaleString("en-GB")} versions)`);
  await knex.raw("analyze field_version_rollups, field_change_rollups, field_week_rollups, field_rollup_changes");
  const times: number[] = [];
  for (let i = 0; i < ONE_REPORT_RUNS; i++) {
    await knex.raw(
      `insert into outcomes (vendor_id, setup_id, sheet_version_id, user_id, machine_id, result, symptom, changes)
       select vendor_id, setup_id, sheet_version_id, user_id, machine_id, result, symptom, changes
       from outcomes where id > gen_random_uuid() order by id limit 1`,
    );
    const { durationMs, versions } = await field.refreshFieldRollups(knex);
    if (versions !== 1) throw new Error(`expected one version recomputed, got ${versions}`);
    times.push(durationMs);
  }
  const oneReportMs = [...times].sort((a, b) => a - b)[Math.floor(times.length / 2)];
  console.log(`refresh after one new outcome report: ${fmt(oneReportMs)} (median of ${ONE_REPORT_RUNS}: ${times.map(fmt).join(", ")})`);
  return { outcomes, rebuildMs: rebuilt.durationMs, oneReportMs };
}

async function run(url: string, knex: Knex, o: Options, refreshOnly = false): Promise<RefreshFigures> {
  console.log(`${o.outcomes.toLocaleString("en-GB")} outcomes over ${o.versions.toLocaleString("en-GB")} versions, ${o.vendors} vendors, ${o.machines.toLocaleString("en-GB")} machines`);
  await seed(knex, o);
  const field = await loadFieldModules(url);
  try {
    const figures = await measureRefresh(knex, field, o.outcomes);
    if (refreshOnly) return figures;
    await printDataShape(knex);

    const vendorIds = (await knex("vendors").orderBy("slug").select("id")).map((v: { id: string }) => v.id);
    const sheets = await loadDrillInSheets(knex, o.iterations);
    const stats = printTable(await measure(field, vendorIds, sheets, o.iterations));
    await printPlans(url, field, vendorIds[0], sheets[0]);

    const page = stats.get("page    overview (all four in parallel)") ?? Infinity;
    const drill = stats.get("page    drill-in loadSheetFieldResults") ?? Infinity;
    console.log(`\nOverview page load p95 ${page.toFixed(1)} ms; drill-in p95 ${drill.toFixed(1)} ms (${drill <= TARGET_P95_MS ? "within" : "over"} ${TARGET_P95_MS} ms)`);
    console.log(`Target p95 ≤ ${TARGET_P95_MS} ms (page load): ${page <= TARGET_P95_MS ? "PASS" : "BELOW"}`);
    return figures;
  } finally {
    await field.db.destroy();
  }
}

/** `--refresh-at 1000000,5000000`: outcome totals to measure the refresh at, or none. */
function refreshSizes(): number[] {
  const at = process.argv.indexOf("--refresh-at");
  if (at === -1) return [];
  const sizes = String(process.argv[at + 1] ?? "").split(",").map(Number);
  if (!sizes.length || sizes.some((n) => !Number.isInteger(n) || n < 1_000 || n > 5_000_000)) throw new Error("--refresh-at takes outcome totals from 1000 to 5000000, comma-separated.");
  return sizes;
}

async function main() {
  const options = readOptions();
  const sizes = refreshSizes();
  if (!sizes.length) {
    await withBenchDatabase({ prefix: "swarfbook_bench_field", poolMax: 4 }, (url, knex) => run(url, knex, options));
    return;
  }
  const figures: RefreshFigures[] = [];
  for (const outcomes of sizes) {
    await withBenchDatabase({ prefix: "swarfbook_bench_field", poolMax: 4 }, async (url, knex) => void figures.push(await run(url, knex, { ...options, outcomes }, true)));
  }
  console.log(`\n${"outcomes".padStart(12)}${"full rebuild".padStart(16)}${"one new report".padStart(18)}`);
  for (const f of figures) console.log(`${f.outcomes.toLocaleString("en-GB").padStart(12)}${fmt(f.rebuildMs).padStart(16)}${fmt(f.oneReportMs).padStart(18)}`);
  const [first, last] = [figures[0], figures.at(-1)!];
  if (figures.length > 1) console.log(`one-report refresh at ${last.outcomes.toLocaleString("en-GB")} vs ${first.outcomes.toLocaleString("en-GB")}: ${(last.oneReportMs / Math.max(1, first.oneReportMs)).toFixed(2)}× (full rebuild ${(last.rebuildMs / Math.max(1, first.rebuildMs)).toFixed(2)}×)`);
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.stack : error);
  process.exitCode = 1;
});
