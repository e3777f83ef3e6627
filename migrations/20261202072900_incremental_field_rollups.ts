import type { Knex } from "knex";

// Field-results rollups whose refresh costs what changed, not the total: the two materialized views become
// tables of the same name and columns, a statement trigger on every source table notes the sheet versions a
// statement touched, and field_rollups_refresh_pending() recomputes only those versions' rows.

// The rows of one set of versions: the same aggregates as the materialized views, narrowed to `ids`.
const VERSION_ROWS = `
  select v.vendor_id, v.id as sheet_version_id, v.sheet_id, v.number, v.state, v.published_at,
    coalesce(a.views, 0)::int as views, coalesce(a.adaptations, 0)::int as adaptations,
    coalesce(st.setups, 0)::int as setups,
    coalesce(o.outcomes, 0)::int as outcomes,
    coalesce(o.worked_as_written, 0)::int as worked_as_written,
    coalesce(o.worked_after_changes, 0)::int as worked_after_changes,
    coalesce(o.failed, 0)::int as failed,
    coalesce(o.chatter, 0)::int as chatter,
    coalesce(o.melting_welding, 0)::int as melting_welding,
    coalesce(o.poor_finish, 0)::int as poor_finish,
    coalesce(o.broken_tool, 0)::int as broken_tool,
    coalesce(o.stalled_lost_steps, 0)::int as stalled_lost_steps,
    o.last_outcome_at,
    coalesce(tk.tickets, 0)::int as tickets,
    coalesce(pr.handoffs, 0)::int as handoffs,
    coalesce(pr.open_handoffs, 0)::int as open_handoffs
  from sheet_versions v
  left join (
    select vendor_id, sheet_version_id, sum(views) as views, sum(adaptations) as adaptations
    from sheet_version_activity where sheet_version_id = any(ids) group by 1, 2
  ) a on a.sheet_version_id = v.id and a.vendor_id = v.vendor_id
  left join (select vendor_id, sheet_version_id, count(*) as setups from setups where sheet_version_id = any(ids) group by 1, 2) st
    on st.sheet_version_id = v.id and st.vendor_id = v.vendor_id
  left join (
    select vendor_id, sheet_version_id, count(*) as outcomes,
      count(*) filter (where result = 'worked_as_written') as worked_as_written,
      count(*) filter (where result = 'worked_after_changes') as worked_after_changes,
      count(*) filter (where result = 'failed') as failed,
      count(*) filter (where symptom = 'chatter') as chatter,
      count(*) filter (where symptom = 'melting_welding') as melting_welding,
      count(*) filter (where symptom = 'poor_finish') as poor_finish,
      count(*) filter (where symptom = 'broken_tool') as broken_tool,
      count(*) filter (where symptom = 'stalled_lost_steps') as stalled_lost_steps,
      max(created_at) as last_outcome_at
    from outcomes where sheet_version_id = any(ids) group by 1, 2
  ) o on o.sheet_version_id = v.id and o.vendor_id = v.vendor_id
  left join (select vendor_id, sheet_version_id, count(distinct ticket_id) as tickets from ticket_sheet_links where sheet_version_id = any(ids) group by 1, 2) tk
    on tk.sheet_version_id = v.id and tk.vendor_id = v.vendor_id
  left join (
    select vendor_id, sheet_version_id, count(*) as handoffs, count(*) filter (where status = 'open') as open_handoffs
    from problem_reports where sheet_version_id = any(ids) group by 1, 2
  ) pr on pr.sheet_version_id = v.id and pr.vendor_id = v.vendor_id
  where v.id = any(ids) and v.state in ('published', 'superseded', 'withdrawn')`;

// Relative change per parameter in "worked after changes" reports: (to / from − 1) · 100 %.
const CHANGE_ROWS = `
  select o.vendor_id, o.sheet_version_id, c.key as param, count(*)::int as reports,
    percentile_cont(0.5) within group (order by p.pct) as median_pct,
    percentile_cont(0.25) within group (order by p.pct) as q1_pct,
    percentile_cont(0.75) within group (order by p.pct) as q3_pct,
    count(*) filter (where p.pct < 0)::int as lowered,
    count(*) filter (where p.pct > 0)::int as raised
  from outcomes o
  cross join lateral jsonb_each(o.changes) as c(key, value)
  cross join lateral (select ((c.value->>'to')::float8 / nullif((c.value->>'from')::float8, 0) - 1) * 100 as pct) p
  where o.sheet_version_id = any(ids) and o.result = 'worked_after_changes' and jsonb_typeof(o.changes) = 'object' and p.pct is not null
  group by 1, 2, 3`;

// Source tables whose rows carry sheet_version_id; sheet_versions itself notes its own id.
const SOURCES = ["outcomes", "setups", "sheet_version_activity", "ticket_sheet_links", "problem_reports"] as const;
const EVENTS = [
  ["insert", "new"],
  ["update", "new"],
  ["delete", "old"],
] as const;

export async function up(knex: Knex): Promise<void> {
  await knex.raw("drop materialized view field_change_rollups");
  await knex.raw("drop materialized view field_version_rollups");

  await knex.raw(`create function field_rollup_version_rows(ids uuid[]) returns table (
      vendor_id uuid, sheet_version_id uuid, sheet_id uuid, number integer, state text, published_at timestamptz,
      views int, adaptations int, setups int, outcomes int, worked_as_written int, worked_after_changes int, failed int,
      chatter int, melting_welding int, poor_finish int, broken_tool int, stalled_lost_steps int, last_outcome_at timestamptz,
      tickets int, handoffs int, open_handoffs int)
    language sql stable as $$ ${VERSION_ROWS} $$`);
  await knex.raw(`create function field_rollup_change_rows(ids uuid[]) returns table (
      vendor_id uuid, sheet_version_id uuid, param text, reports int, median_pct float8, q1_pct float8, q3_pct float8, lowered int, raised int)
    language sql stable as $$ ${CHANGE_ROWS} $$`);

  await knex.raw("create table field_version_rollups as select * from field_rollup_version_rows('{}') with no data");
  await knex.raw("alter table field_version_rollups add primary key (sheet_version_id)");
  await knex.raw("create index field_version_rollups_vendor on field_version_rollups (vendor_id, state)");
  await knex.raw("create index field_version_rollups_sheet on field_version_rollups (vendor_id, sheet_id, number)");
  await knex.raw("create table field_change_rollups as select * from field_rollup_change_rows('{}') with no data");
  await knex.raw("alter table field_change_rollups add primary key (sheet_version_id, param)");
  await knex.raw("create index field_change_rollups_vendor on field_change_rollups (vendor_id, reports desc)");

  // The versions a write touched since the last refresh (appended by triggers, emptied by the refresh).
  await knex.raw("create table field_rollup_changes (id bigserial primary key, sheet_version_id uuid not null)");

  await knex.raw(`create function field_rollups_refresh_versions(ids uuid[]) returns void language plpgsql as $$
    begin
      delete from field_version_rollups r where r.sheet_version_id = any(ids);
      insert into field_version_rollups select * from field_rollup_version_rows(ids);
      delete from field_change_rollups r where r.sheet_version_id = any(ids);
      insert into field_change_rollups select * from field_rollup_change_rows(ids);
    end $$`);
  // One refresher at a time (transaction-scoped lock, fine behind a transaction pooler); returns the versions redone.
  await knex.raw(`create function field_rollups_refresh_pending(batch int) returns int language plpgsql as $$
    declare ids uuid[];
    begin
      perform pg_advisory_xact_lock(hashtextextended('field_rollups', 0));
      with claimed as (
        delete from field_rollup_changes where id in (select id from field_rollup_changes order by id limit batch)
        returning sheet_version_id
      ) select array_agg(distinct sheet_version_id) into ids from claimed;
      if ids is null then return 0; end if;
      perform field_rollups_refresh_versions(ids);
      return cardinality(ids);
    end $$`);
  await knex.raw(`create function field_rollups_rebuild() returns int language plpgsql as $$
    declare ids uuid[];
    begin
      perform pg_advisory_xact_lock(hashtextextended('field_rollups', 0));
      delete from field_rollup_changes;
      truncate field_version_rollups, field_change_rollups;
      select array_agg(id) into ids from sheet_versions;
      if ids is null then return 0; end if;
      perform field_rollups_refresh_versions(ids);
      return cardinality(ids);
    end $$`);

  await knex.raw(`create function field_rollups_note_rows() returns trigger language plpgsql as $$
    begin
      insert into field_rollup_changes (sheet_version_id) select distinct sheet_version_id from touched;
      return null;
    end $$`);
  await knex.raw(`create function field_rollups_note_versions() returns trigger language plpgsql as $$
    begin
      insert into field_rollup_changes (sheet_version_id) select id from touched;
      return null;
    end $$`);
  for (const table of [...SOURCES, "sheet_versions"]) {
    const fn = table === "sheet_versions" ? "field_rollups_note_versions" : "field_rollups_note_rows";
    for (const [event, side] of EVENTS) {
      await knex.raw(`create trigger ${table}_field_rollups_${event} after ${event} on ${table}
        referencing ${side} table as touched for each statement execute function ${fn}()`);
    }
  }
  await knex.raw("select field_rollups_rebuild()");
}

export async function down(knex: Knex): Promise<void> {
  for (const table of [...SOURCES, "sheet_versions"]) {
    for (const [event] of EVENTS) await knex.raw(`drop trigger if exists ${table}_field_rollups_${event} on ${table}`);
  }
  for (const fn of [
    "field_rollups_note_versions()",
    "field_rollups_note_rows()",
    "field_rollups_rebuild()",
    "field_rollups_refresh_pending(int)",
    "field_rollups_refresh_versions(uuid[])",
  ]) {
    await knex.raw(`drop function ${fn}`);
  }
  await knex.raw("drop table field_rollup_changes, field_change_rollups, field_version_rollups");
  // Back to the materialized views, over every version, built from the same row functions.
  await knex.raw(
    "create materialized view field_version_rollups as select * from field_rollup_version_rows(array(select id from sheet_versions))",
  );
  await knex.raw("create unique index field_version_rollups_version on field_version_rollups (sheet_version_id)");
  await knex.raw("create index field_version_rollups_vendor on field_version_rollups (vendor_id, state)");
  await knex.raw("create index field_version_rollups_sheet on field_version_rollups (vendor_id, sheet_id, number)");
  await knex.raw(
    "create materialized view field_change_rollups as select * from field_rollup_change_rows(array(select id from sheet_versions))",
  );
  await knex.raw("create unique index field_change_rollups_key on field_change_rollups (sheet_version_id, param)");
  await knex.raw("create index field_change_rollups_vendor on field_change_rollups (vendor_id, reports desc)");
}
