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
//   · the drill-in, findSheetFieldResults(), for random sheets;
//   · EXPLAIN ANALYZE of the needs-attention query and the execution time of every query the pages issue.
// Each measured phase stops after --iterations runs or PHASE_BUDGET_MS, whichever comes first.
// The database is always dropped at the end.
// Run: npm run bench:field -- [--outcomes 1000000] [--versions 20000] [--vendors 20] [--machines 50000] [--iterations 200]
// Only the refresh figures, at several sizes (one throwaway database each): npm run bench:field -- --refresh-at 1000000,5000000
import type { Knex } from "knex";

import { arg } from "./lib/bench-args";
import { withBenchDatabase } from "./lib/bench-database";
import { loadDrillInSheets, loadFieldModules, measure, measureRefresh, type RefreshFigures } from "./lib/field-bench/measure";
import { printDataShape, printPlans, printTable } from "./lib/field-bench/report";
import { seed } from "./lib/field-bench/seed";
import { fmt, type Options } from "./lib/field-bench/shape";

const TARGET_P95_MS = 200;

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

async function run(url: string, knex: Knex, o: Options, refreshOnly = false): Promise<RefreshFigures> {
  console.log(
    `${o.outcomes.toLocaleString("en-GB")} outcomes over ${o.versions.toLocaleString("en-GB")} versions, ${o.vendors} vendors, ${o.machines.toLocaleString("en-GB")} machines`,
  );
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
    const drill = stats.get("page    drill-in findSheetFieldResults") ?? Infinity;
    console.log(
      `\nOverview page load p95 ${page.toFixed(1)} ms; drill-in p95 ${drill.toFixed(1)} ms (${drill <= TARGET_P95_MS ? "within" : "over"} ${TARGET_P95_MS} ms)`,
    );
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
  const sizes = String(process.argv[at + 1] ?? "")
    .split(",")
    .map(Number);
  if (!sizes.length || sizes.some((n) => !Number.isInteger(n) || n < 1_000 || n > 5_000_000))
    throw new Error("--refresh-at takes outcome totals from 1000 to 5000000, comma-separated.");
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
    await withBenchDatabase(
      { prefix: "swarfbook_bench_field", poolMax: 4 },
      async (url, knex) => void figures.push(await run(url, knex, { ...options, outcomes }, true)),
    );
  }
  console.log(`\n${"outcomes".padStart(12)}${"full rebuild".padStart(16)}${"one new report".padStart(18)}`);
  for (const f of figures)
    console.log(`${f.outcomes.toLocaleString("en-GB").padStart(12)}${fmt(f.rebuildMs).padStart(16)}${fmt(f.oneReportMs).padStart(18)}`);
  const [first, last] = [figures[0], figures.at(-1)!];
  if (figures.length > 1)
    console.log(
      `one-report refresh at ${last.outcomes.toLocaleString("en-GB")} vs ${first.outcomes.toLocaleString("en-GB")}: ${(last.oneReportMs / Math.max(1, first.oneReportMs)).toFixed(2)}× (full rebuild ${(last.rebuildMs / Math.max(1, first.rebuildMs)).toFixed(2)}×)`,
    );
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.stack : error);
  process.exitCode = 1;
});
