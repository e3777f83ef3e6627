import type { Knex } from "knex";

// Field results: daily view/adaptation counters per sheet version, two materialized rollups that a job
// refreshes (so a page view never scans raw outcomes), and the digest log that keeps a retry from mailing twice.
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("sheet_version_activity", (t) => {
    t.uuid("vendor_id").notNullable().references("vendors.id").onDelete("CASCADE");
    t.uuid("sheet_version_id").notNullable().references("sheet_versions.id").onDelete("CASCADE");
    t.date("day").notNullable();
    t.integer("views").notNullable().defaultTo(0);
    t.integer("adaptations").notNullable().defaultTo(0);
    t.primary(["sheet_version_id", "day"]);
    t.index(["vendor_id", "day"]);
  });

  await knex.schema.createTable("field_digests_sent", (t) => {
    t.uuid("vendor_id").notNullable().references("vendors.id").onDelete("CASCADE");
    t.uuid("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.date("week_start").notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(["vendor_id", "user_id", "week_start"]);
  });

  await knex.schema.createTable("field_rollup_refreshes", (t) => {
    t.text("name").primary();
    t.timestamp("refreshed_at", { useTz: true }).notNullable();
    t.integer("duration_ms").notNullable();
  });

  // Every sub-aggregate groups by vendor as well as version, so a row can only ever hold one vendor's data.
  await knex.raw(`
    create materialized view field_version_rollups as
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
      from sheet_version_activity group by 1, 2
    ) a on a.sheet_version_id = v.id and a.vendor_id = v.vendor_id
    left join (select vendor_id, sheet_version_id, count(*) as setups from setups group by 1, 2) st
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
      from outcomes group by 1, 2
    ) o on o.sheet_version_id = v.id and o.vendor_id = v.vendor_id
    left join (select vendor_id, sheet_version_id, count(distinct ticket_id) as tickets from ticket_sheet_links group by 1, 2) tk
      on tk.sheet_version_id = v.id and tk.vendor_id = v.vendor_id
    left join (
      select vendor_id, sheet_version_id, count(*) as handoffs, count(*) filter (where status = 'open') as open_handoffs
      from problem_reports group by 1, 2
    ) pr on pr.sheet_version_id = v.id and pr.vendor_id = v.vendor_id
    where v.state in ('published', 'superseded', 'withdrawn')
  `);
  await knex.raw("create unique index field_version_rollups_version on field_version_rollups (sheet_version_id)");
  await knex.raw("create index field_version_rollups_vendor on field_version_rollups (vendor_id, state)");
  await knex.raw("create index field_version_rollups_sheet on field_version_rollups (vendor_id, sheet_id, number)");

  // Relative change per parameter in "worked after changes" reports: (to / from − 1) · 100 %.
  await knex.raw(`
    create materialized view field_change_rollups as
    select o.vendor_id, o.sheet_version_id, c.key as param, count(*)::int as reports,
      percentile_cont(0.5) within group (order by p.pct) as median_pct,
      percentile_cont(0.25) within group (order by p.pct) as q1_pct,
      percentile_cont(0.75) within group (order by p.pct) as q3_pct,
      count(*) filter (where p.pct < 0)::int as lowered,
      count(*) filter (where p.pct > 0)::int as raised
    from outcomes o
    cross join lateral jsonb_each(o.changes) as c(key, value)
    cross join lateral (select ((c.value->>'to')::float8 / nullif((c.value->>'from')::float8, 0) - 1) * 100 as pct) p
    where o.result = 'worked_after_changes' and jsonb_typeof(o.changes) = 'object' and p.pct is not null
    group by 1, 2, 3
  `);
  await knex.raw("create unique index field_change_rollups_key on field_change_rollups (sheet_version_id, param)");
  await knex.raw("create index field_change_rollups_vendor on field_change_rollups (vendor_id, reports desc)");
}

export async function down(knex: Knex): Promise<void> {
  await knex.raw("drop materialized view if exists field_change_rollups");
  await knex.raw("drop materialized view if exists field_version_rollups");
  for (const table of ["field_rollup_refreshes", "field_digests_sent", "sheet_version_activity"])
    await knex.schema.dropTableIfExists(table);
}
