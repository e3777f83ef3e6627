import type { Knex } from "knex";

// Two rollups for closing the field loop, refreshed by the same incremental job in the same transaction as the
// others (field_rollups_refresh_versions):
// - field_change_rollups gains operation_index (from the report's setup), so a suggestion names the operation
//   whose number customers changed and a draft can apply the median to that operation only;
// - field_week_rollups: outcome counts per version and UTC week (weeks start on Monday), for trends and for
//   date-filtered lists that would otherwise scan raw outcome reports.

const CHANGE_ROWS = `
  select o.vendor_id, o.sheet_version_id, st.operation_index, c.key as param, count(*)::int as reports,
    percentile_cont(0.5) within group (order by p.pct) as median_pct,
    percentile_cont(0.25) within group (order by p.pct) as q1_pct,
    percentile_cont(0.75) within group (order by p.pct) as q3_pct,
    count(*) filter (where p.pct < 0)::int as lowered,
    count(*) filter (where p.pct > 0)::int as raised
  from outcomes o
  join setups st on st.id = o.setup_id and st.vendor_id = o.vendor_id
  cross join lateral jsonb_each(o.changes) as c(key, value)
  cross join lateral (select ((c.value->>'to')::float8 / nullif((c.value->>'from')::float8, 0) - 1) * 100 as pct) p
  where o.sheet_version_id = any(ids) and o.result = 'worked_after_changes' and jsonb_typeof(o.changes) = 'object' and p.pct is not null
  group by 1, 2, 3, 4`;

const WEEK_ROWS = `
  select o.vendor_id, o.sheet_version_id, v.sheet_id, (date_trunc('week', o.created_at at time zone 'UTC'))::date as week,
    count(*)::int as outcomes,
    count(*) filter (where o.result = 'worked_as_written')::int as worked_as_written,
    count(*) filter (where o.result = 'worked_after_changes')::int as worked_after_changes,
    count(*) filter (where o.result = 'failed')::int as failed,
    count(*) filter (where o.symptom = 'chatter')::int as chatter,
    count(*) filter (where o.symptom = 'melting_welding')::int as melting_welding,
    count(*) filter (where o.symptom = 'poor_finish')::int as poor_finish,
    count(*) filter (where o.symptom = 'broken_tool')::int as broken_tool,
    count(*) filter (where o.symptom = 'stalled_lost_steps')::int as stalled_lost_steps
  from outcomes o
  join sheet_versions v on v.id = o.sheet_version_id and v.vendor_id = o.vendor_id
  where o.sheet_version_id = any(ids) and v.state in ('published', 'superseded', 'withdrawn')
  group by 1, 2, 3, 4`;

const OLD_CHANGE_ROWS = `
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

const REFRESH_WITH_WEEKS = `create or replace function field_rollups_refresh_versions(ids uuid[]) returns void language plpgsql as $$
    begin
      delete from field_version_rollups r where r.sheet_version_id = any(ids);
      insert into field_version_rollups select * from field_rollup_version_rows(ids);
      delete from field_change_rollups r where r.sheet_version_id = any(ids);
      insert into field_change_rollups select * from field_rollup_change_rows(ids);
      delete from field_week_rollups r where r.sheet_version_id = any(ids);
      insert into field_week_rollups select * from field_rollup_week_rows(ids);
    end $$`;

const REFRESH_WITHOUT_WEEKS = `create or replace function field_rollups_refresh_versions(ids uuid[]) returns void language plpgsql as $$
    begin
      delete from field_version_rollups r where r.sheet_version_id = any(ids);
      insert into field_version_rollups select * from field_rollup_version_rows(ids);
      delete from field_change_rollups r where r.sheet_version_id = any(ids);
      insert into field_change_rollups select * from field_rollup_change_rows(ids);
    end $$`;

const REBUILD = (tables: string) => `create or replace function field_rollups_rebuild() returns int language plpgsql as $$
    declare ids uuid[];
    begin
      perform pg_advisory_xact_lock(hashtextextended('field_rollups', 0));
      delete from field_rollup_changes;
      truncate ${tables};
      select array_agg(id) into ids from sheet_versions;
      if ids is null then return 0; end if;
      perform field_rollups_refresh_versions(ids);
      return cardinality(ids);
    end $$`;

async function changeTable(knex: Knex, rows: string, withOperation: boolean): Promise<void> {
  await knex.raw("drop table field_change_rollups");
  await knex.raw("drop function field_rollup_change_rows(uuid[])");
  await knex.raw(`create function field_rollup_change_rows(ids uuid[]) returns table (
      vendor_id uuid, sheet_version_id uuid, ${withOperation ? "operation_index int," : ""} param text, reports int, median_pct float8, q1_pct float8, q3_pct float8, lowered int, raised int)
    language sql stable as $$ ${rows} $$`);
  await knex.raw("create table field_change_rollups as select * from field_rollup_change_rows('{}') with no data");
  await knex.raw(`alter table field_change_rollups add primary key (sheet_version_id, ${withOperation ? "operation_index, " : ""}param)`);
  await knex.raw("create index field_change_rollups_vendor on field_change_rollups (vendor_id, reports desc)");
}

export async function up(knex: Knex): Promise<void> {
  await changeTable(knex, CHANGE_ROWS, true);
  await knex.raw(`create function field_rollup_week_rows(ids uuid[]) returns table (
      vendor_id uuid, sheet_version_id uuid, sheet_id uuid, week date, outcomes int, worked_as_written int, worked_after_changes int, failed int,
      chatter int, melting_welding int, poor_finish int, broken_tool int, stalled_lost_steps int)
    language sql stable as $$ ${WEEK_ROWS} $$`);
  await knex.raw("create table field_week_rollups as select * from field_rollup_week_rows('{}') with no data");
  await knex.raw("alter table field_week_rollups add primary key (sheet_version_id, week)");
  await knex.raw("alter table field_week_rollups alter column vendor_id set not null");
  await knex.raw("create index field_week_rollups_sheet on field_week_rollups (vendor_id, sheet_id, week)");
  await knex.raw("create index field_week_rollups_week on field_week_rollups (vendor_id, week)");
  await knex.raw(REFRESH_WITH_WEEKS);
  await knex.raw(REBUILD("field_version_rollups, field_change_rollups, field_week_rollups"));
  await knex.raw("select field_rollups_rebuild()");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw(REFRESH_WITHOUT_WEEKS);
  await knex.raw(REBUILD("field_version_rollups, field_change_rollups"));
  await knex.raw("drop table field_week_rollups");
  await knex.raw("drop function field_rollup_week_rows(uuid[])");
  await changeTable(knex, OLD_CHANGE_ROWS, false);
  await knex.raw("select field_rollups_rebuild()");
}
