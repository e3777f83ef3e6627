// Seeding the throwaway database set-based: catalogue and versions, then the field data in one transaction.
import type { Knex } from "knex";

import { CHANGEABLE_PARAMS, OUTCOME_SYMPTOMS } from "../../../content-schema/outcome-fields";
import { createBenchVendor } from "../../bench-search-data";
import {
  ACTIVITY_DAYS,
  CHANGE_PARAMS,
  CLASS_SPECS,
  countRows,
  fmt,
  MACHINE_ARCHETYPES,
  MACHINES_PER_CUSTOMER,
  REPORTED_SHARE,
  rowCount,
  SECOND_VERSION_SHARE,
  SETUPS_PER_OUTCOME,
  split,
  step,
  TICKETS_PER_VENDOR,
  valuesList,
  type Options,
} from "./shape";

/** Supersedes `count` random published v1s of a vendor and publishes a v2 for each (the guard trigger allows published → superseded). */
export async function addSecondVersions(knex: Knex, vendorId: string, count: number) {
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
export async function seedCatalogue(knex: Knex, o: Options) {
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

export async function seedVendorIndex(trx: Knex.Transaction) {
  await trx.raw(`create temp table bench_vendor on commit drop as
    select (row_number() over (order by slug))::int - 1 as idx, id from vendors`);
}

/** Customers: users with a 'customer' membership, spread round-robin over the vendors. */
export async function seedCustomers(trx: Knex.Transaction, o: Options) {
  const customers = Math.max(o.vendors, Math.round(o.machines / MACHINES_PER_CUSTOMER));
  await trx.raw(
    `create temp table bench_customer on commit drop as
     select g % ?::int as vendor_idx, g / ?::int as k, g, gen_random_uuid() as user_id from generate_series(0, ?::int - 1) g`,
    [o.vendors, o.vendors, customers],
  );
  await trx.raw("analyze bench_customer");
  await trx.raw(`insert into users (id, email, name, email_verified)
    select user_id, 'bench-customer-' || g || '@example.test', 'Bench customer ' || g, now() from bench_customer`);
  return rowCount(
    trx.raw(`insert into members (vendor_id, user_id, role)
    select v.id, c.user_id, 'customer' from bench_customer c join bench_vendor v on v.idx = c.vendor_idx`),
  );
}

/** Machines: an archetype each (by share), with jitter, rounded: rpm to 1000, kW to 0.1, rigidity to 0.05. */
export async function seedMachines(trx: Knex.Transaction, o: Options) {
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
  return rowCount(
    trx.raw(`insert into machines (id, vendor_id, user_id, name, preset, rpm_min, rpm_max, power_kw, max_feed_mm_min, rigidity)
    select m.id, v.id, m.user_id, 'Bench machine ' || m.k, m.preset, m.rpm_min, m.rpm_max, m.power_kw, m.max_feed_mm_min, m.rigidity
    from bench_machine m join bench_vendor v on v.idx = m.vendor_idx`),
  );
}

/**
 * Per version: a random place in its vendor's popularity order (k, rank01) and how it fares in the field —
 * a superseded v1 fails often and its v2 rarely, ~8 % of the other versions are troubled — plus its most common
 * symptom, the parameter customers change most and by what factor.
 */
export async function seedVersionProfiles(trx: Knex.Transaction) {
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
export async function seedSetups(trx: Knex.Transaction, o: Options) {
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
  return rowCount(
    trx.raw(`insert into setups (id, vendor_id, user_id, machine_id, sheet_version_id, result, created_at, updated_at)
    select id, vendor_id, user_id, machine_id, version_id, '{}'::jsonb, created_at, created_at from bench_setup order by id`),
  );
}

/**
 * Outcomes on random setups: failed with the version's failure rate (its usual symptom 60 % of the time),
 * worked after changes with its change rate (its usual parameter 70 % of the time, by its factor; a second
 * parameter backed off in 30 % of those reports), else worked as written.
 */
export async function seedOutcomes(trx: Knex.Transaction, o: Options) {
  const setups = await countRows(trx, "bench_setup");
  const params = CHANGEABLE_PARAMS.map((p) => [p, CHANGE_PARAMS[p].base, CHANGE_PARAMS[p].step] as const);
  const change = (idx: string, from: string, to: string) =>
    `jsonb_build_object(k.params[${idx} + 1], jsonb_build_object(
       'from', ${from}, 'to', greatest(k.steps[${idx} + 1], round(${to} / k.steps[${idx} + 1]) * k.steps[${idx} + 1])))`;
  const fromValue = (idx: string, u: string) =>
    `greatest(k.steps[${idx} + 1], round((k.bases[${idx} + 1] * (0.6 + 0.8 * ${u}))::numeric / k.steps[${idx} + 1]) * k.steps[${idx} + 1])`;
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
export async function seedActivity(trx: Knex.Transaction) {
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
export async function seedTickets(trx: Knex.Transaction) {
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
  await trx.raw(
    "insert into ticket_sheet_links (vendor_id, ticket_id, sheet_version_id) select vendor_id, id, version_id from bench_ticket",
  );
  await trx.raw(`insert into problem_reports (vendor_id, sheet_version_id, ticket_id, summary, status)
    select vendor_id, version_id, id, 'Bench hand-off for ticket ' || number, case when number % 2 = 0 then 'open' else 'resolved' end
    from bench_ticket where number % 3 = 0`);
  return tickets;
}

/**
 * Bulk-load trick: drops the table's secondary indexes (not those behind a constraint), runs `load`, and builds
 * them again from their own definitions; one sorted build is far cheaper than a million random B-tree inserts.
 */
export async function withIndexesRebuiltAfter<T>(trx: Knex.Transaction, table: string, load: () => Promise<T>): Promise<T> {
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
export async function skipTriggersIfAllowed(trx: Knex.Transaction) {
  const { rows } = await trx.raw<{ rows: { superuser: boolean }[] }>(
    "select rolsuper as superuser from pg_roles where rolname = current_user",
  );
  if (rows[0]?.superuser) await trx.raw("set local session_replication_role = replica");
  else console.log("  (not a superuser: foreign-key checks stay on, seeding is slower)");
}

export async function seedFieldData(knex: Knex, o: Options) {
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

export async function seed(knex: Knex, o: Options) {
  const started = performance.now();
  console.log("seeding:");
  await step("sheet versions (createBenchVendor + v2s)", () => seedCatalogue(knex, o));
  await seedFieldData(knex, o);
  await step("vacuum analyze", () => knex.raw("vacuum analyze"));
  console.log(`seeding took ${fmt(performance.now() - started)}`);
}
