// Reporting: the data shape, the latency table and the query plans.
import type { Knex } from "knex";
import pg from "pg";

import { percentile } from "../bench-args";
import type { Field } from "./measure";
import type { Samples, SheetPick } from "./shape";

export async function printDataShape(knex: Knex) {
  const { rows } = await knex.raw<{ rows: Record<string, number>[] }>(`
    select (select count(*) from sheet_versions where state = 'published')::int as published,
      (select count(*) from sheet_versions where state = 'superseded')::int as superseded,
      (select count(*) from field_version_rollups where outcomes > 0)::int as versions_with_reports,
      (select count(*) from field_version_rollups where state = 'published' and failed > 0)::int as published_with_failures,
      (select round(100.0 * sum(failed) / nullif(sum(outcomes), 0), 1)::float8 from field_version_rollups) as failed_pct,
      (select count(*) from field_change_rollups)::int as change_rollups,
      (select count(distinct (rpm_min, rpm_max, power_kw, rigidity)) from machines)::int as machine_groups`);
  const r = rows[0];
  console.log(
    `data: ${r.published} published + ${r.superseded} superseded versions; ${r.versions_with_reports} with reports, ${r.published_with_failures} published with failures; ` +
      `${r.failed_pct} % of reports failed; ${r.change_rollups} change rollup rows; ${r.machine_groups} distinct machine specs`,
  );
}

export function printTable(samples: Samples) {
  console.log(`\n${"".padEnd(48)}${["n", "p50", "p95", "p99", "max"].map((h) => h.padStart(8)).join("")}   (ms)`);
  const stats = new Map<string, number>();
  for (const [name, ms] of samples) {
    const sorted = [...ms].sort((a, b) => a - b);
    const [p50, p95, p99] = [50, 95, 99].map((p) => percentile(sorted, p));
    stats.set(name, p95);
    console.log(
      `${name.padEnd(48)}${String(sorted.length).padStart(8)}${[p50, p95, p99, sorted.at(-1)!].map((v) => v.toFixed(1).padStart(8)).join("")}`,
    );
  }
  return stats;
}

export type Captured = { sql: string; bindings: unknown[] };

/** The SQL (native $n form) and bindings of every query `run` sends through the app's pool. */
export async function captureQueries(db: Knex, run: () => Promise<unknown>): Promise<Captured[]> {
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

export async function explain(client: pg.Client, q: Captured, options = "analyze") {
  const { rows } = await client.query<{ "QUERY PLAN": string }>(`explain (${options}) ${q.sql}`, q.bindings);
  return rows.map((r) => r["QUERY PLAN"]);
}

export async function printPlans(url: string, field: Field, vendorId: string, sheet: SheetPick) {
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
      ["findSheetFieldResults", () => field.drillIn(sheet)],
    ];
    for (const [name, run] of pages) {
      for (const q of await captureQueries(field.db, run)) {
        const plan = await explain(client, q);
        const ms = (label: string) => plan.find((line) => line.startsWith(label))?.replace(/[^\d.]/g, "") ?? "?";
        console.log(
          `  exec ${ms("Execution Time").padStart(8)} ms  plan ${ms("Planning Time").padStart(6)} ms  ${name}: ${q.sql.replace(/\s+/g, " ").slice(0, 90)}…`,
        );
      }
    }
  } finally {
    await client.end();
  }
}
