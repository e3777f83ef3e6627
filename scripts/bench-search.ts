// Benchmark of the PostgreSQL search engine: synthetic catalogues in a throwaway database of the
// local cluster (never the dev database), 20 concurrent clients, p50/p95/p99 and the main query plan, and the
// ratio of a whole search to its first SQL statement run bare with the same clients, in alternating blocks.
// Run: node --conditions=react-server --import tsx scripts/bench-search.ts [--versions 20000] [--vendors 20] [--queries 4000] [--clients 20] [--seconds 120]
import type { Knex } from "knex";

import { buildSearchSql } from "../search/engines/postgres/pg-search-sql";
import { createPostgresEngine } from "../search/engines/postgres/postgres-engine";
import { preparedQuery, preparedStatementsEnabled } from "../search/engines/postgres/prepared-query";
import { reindexVendor } from "../search/indexing/reindex";
import { engineQueriesFor, runSearch } from "../search/run/run-search";
import { createBenchVendor, queryMix, type BenchVendor } from "./bench-search-data";
import { arg, percentile } from "./lib/bench-args";
import { runBlocks } from "./lib/bench-blocks";
import { withBenchDatabase } from "./lib/bench-database";
import { reportRatio, summarize } from "./lib/bench-report";

async function main() {
  const versions = arg("versions", 20_000, 200_000);
  const vendorCount = arg("vendors", 20, 100);
  const queries = arg("queries", 4_000, 50_000);
  const CLIENTS = arg("clients", 20, 100);
  await withBenchDatabase({ prefix: "swarfbook_bench", poolMax: CLIENTS }, async (_url, knex) => {
    let t = performance.now();
    const vendors: BenchVendor[] = [];
    const per = Math.floor(versions / vendorCount);
    for (let i = 0; i < vendorCount; i++) vendors.push(await createBenchVendor(knex, i, per + (i < versions % vendorCount ? 1 : 0)));
    console.log(`generated ${versions} published versions across ${vendorCount} vendors in ${Math.round(performance.now() - t)} ms`);
    const pgEngine = createPostgresEngine(knex);
    let roundTrips = 0;
    const engine = {
      ...pgEngine,
      search: (...args: Parameters<typeof pgEngine.search>) => (roundTrips++, pgEngine.search(...args)),
      searchSteps: async (...args: Parameters<NonNullable<typeof pgEngine.searchSteps>>) => {
        const found = await pgEngine.searchSteps!(...args);
        roundTrips += found.roundTrips ?? 1;
        return found;
      },
    };
    t = performance.now();
    for (const v of vendors) await reindexVendor({ engine, knex, vendorId: v.id });
    await knex.raw("analyze");
    const { rows } = await knex.raw<{ rows: { n: number }[] }>("select count(*)::int as n from search_documents");
    console.log(`indexed ${rows[0].n} documents in ${Math.round(performance.now() - t)} ms`);

    const mix = queryMix(vendors, queries);
    for (const item of mix.slice(0, 200)) await runSearch(engine, item); // warm-up
    // The bare statement: the first SQL statement of the same search, built beforehand, run on the same pool.
    const bare = mix.map((item) => buildSearchSql(engineQueriesFor(item).steps[0].query));
    roundTrips = 0;
    const [searchResult, bareResult] = await runBlocks({
      kinds: [
        { name: "runSearch", run: async (i) => void (await runSearch(engine, mix[i % mix.length])) },
        { name: "bare SQL", run: async (i) => void (await preparedQuery(knex, bare[i % bare.length].sql, bare[i % bare.length].bindings)) },
      ],
      clients: CLIENTS,
      perBlock: Math.max(CLIENTS, Math.floor(queries / 8)),
      blocks: 8,
      maxSeconds: arg("seconds", 120, 600),
    });
    const latencies = searchResult.latencies;
    const tripsPerSearch = roundTrips / Math.max(1, latencies.length);
    if (process.argv.includes("--by-query")) {
      const byQuery = new Map<string, number[]>();
      for (const item of mix.slice(0, 300)) {
        const started = performance.now();
        await runSearch(engine, item);
        const key = /^B\d+-/.test(item.q) ? "<sku>" : item.q;
        byQuery.set(key, [...(byQuery.get(key) ?? []), performance.now() - started]);
      }
      for (const [q, ms] of byQuery) console.log(`  ${(ms.reduce((a, b) => a + b, 0) / ms.length).toFixed(1).padStart(6)} ms  “${q}”`);
    }
    const [p50, p95, p99] = [50, 95, 99].map((p) => percentile(latencies, p));

    const at = process.argv.indexOf("--explain");
    const sample = at === -1 ? "1/8 acrylic slot" : process.argv[at + 1];
    const { sql, bindings } = buildSearchSql(engineQueriesFor({ vendorId: vendors[0].id, q: sample }).steps[0].query);
    const explain = await knex.raw<{ rows: { "QUERY PLAN": string }[] }>(`explain (analyze, buffers) ${sql}`, bindings as Knex.ValueDict[]);
    console.log(`\nmain query plan for “${sample}” (vendor ${vendors[0].slug}):`);
    console.log(explain.rows.map((r) => r["QUERY PLAN"]).join("\n"));

    if (process.argv.includes("--explain-mix")) {
      console.log("\nPostgreSQL execution + planning time of the first query of each search in the mix:");
      for (const q of [...new Set(mix.map((m) => (/^B\d+-/.test(m.q) ? vendors[0].skus[0] : m.q)))]) {
        const first = buildSearchSql(engineQueriesFor({ vendorId: vendors[0].id, q }).steps[0].query);
        const rows = (
          await knex.raw<{ rows: { "QUERY PLAN": string }[] }>(`explain (analyze) ${first.sql}`, first.bindings as Knex.ValueDict[])
        ).rows.map((r) => r["QUERY PLAN"]);
        const ms = (label: string) => rows.find((r) => r.startsWith(label))?.replace(/[^\d.]/g, "") ?? "?";
        console.log(`  exec ${ms("Execution Time").padStart(7)} ms  plan ${ms("Planning Time").padStart(6)} ms  “${q}”`);
      }
    }
    const search = summarize(searchResult);
    console.log(
      `\n${latencies.length} searches, ${CLIENTS} concurrent clients, ${Math.round(search.perSecond)} searches/s, ${tripsPerSearch.toFixed(2)} engine round trips per search`,
    );
    console.log(`p50 ${p50.toFixed(1)} ms · p95 ${p95.toFixed(1)} ms · p99 ${p99.toFixed(1)} ms · max ${latencies.at(-1)!.toFixed(1)} ms`);
    console.log(`plan reuse (named prepared statements): ${preparedStatementsEnabled() ? "on" : "off"}`);
    reportRatio("search/bare-SQL", search, summarize(bareResult), { p95: 1.3, throughput: 0.8 });
  });
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.stack : error);
  process.exitCode = 1;
});
