// Benchmark of whole pages and API calls of the production build, each as a ratio to a baseline the same server
// answers in the same run (blocks in turn, same clients): the Library sheet page, a search API call, the Desk
// queue and a long ticket thread against a static file; POST /api/v1/calculate against GET /api/health; and the
// compressed JavaScript of the Library sheet page. A throwaway database holds the demo plus synthetic data.
// Run: npm run bench:pages -- [--no-build] [--port 3117] [--versions 20000] [--tickets 100000] [--messages 500]
//        [--clients 8] [--blocks 6] [--per-block 40] [--seconds 40] [--only sheet,search,desk,thread,calculate]
import path from "node:path";

import { BENCH_DIST_DIR, buildApp, startApp } from "./bench-pages/app-server";
import { requester, sessionCookie } from "./bench-pages/http-get";
import { pageJavaScript } from "./bench-pages/page-javascript";
import { seedPagesData } from "./bench-pages/seed-pages-data";
import { staticFilePath } from "./bench-pages/static-file";
import { arg } from "./lib/bench-args";
import { runBlocks } from "./lib/bench-blocks";
import { withBenchDatabase } from "./lib/bench-database";
import { reportRatio, summarize } from "./lib/bench-report";

const SHEET_JS_GOAL_KB = 110;
const CALCULATE_BODY = JSON.stringify({
  units: "metric",
  operation: {
    kind: "slotting",
    diameter: { value: 6, unit: "mm" },
    flutes: 2,
    spindleSpeed: { value: 18000, unit: "rpm" },
    feed: { value: 2500, unit: "mm/min" },
    axialDepth: { value: 3, unit: "mm" },
    radialDepth: { value: 6, unit: "mm" },
  },
  material: {
    cuttingSpeedWindow: { min: 100, max: 350, unit: "m/min" },
    minChipLoad: { value: 0.05, unit: "mm/tooth" },
    specificCuttingForce: { value: 100, unit: "N/mm²" },
  },
  referenceMachine: { rigidity: 0.8 },
  machine: {
    spindleSpeed: { min: 8000, max: 12000, unit: "rpm" },
    maxFeed: { value: 4000, unit: "mm/min" },
    spindlePower: { value: 0.8, unit: "kW" },
    rigidity: 0.5,
  },
});

async function main() {
  const port = arg("port", Number(process.env.BENCH_APP_PORT ?? 3117), 65535, 1024);
  const clients = arg("clients", 8, 64);
  const blocks = arg("blocks", 6, 50);
  const perBlock = arg("per-block", 40, 2000);
  const seconds = arg("seconds", 40, 600);
  const at = process.argv.indexOf("--only");
  const only = new Set(at === -1 ? ["sheet", "search", "desk", "thread", "calculate"] : process.argv[at + 1].split(","));
  const logDir = path.join(import.meta.dirname, "../.tmp/bench-pages");
  if (!process.argv.includes("--no-build")) await buildApp(logDir);

  await withBenchDatabase({ prefix: "swarfbook_pages", poolMax: 4 }, async (url, knex) => {
    const targets = await seedPagesData(knex, {
      versions: arg("versions", 20_000, 200_000),
      tickets: arg("tickets", 100_000, 1_000_000),
      messages: arg("messages", 500, 5_000),
    });
    const app = await startApp({ databaseUrl: url, port, logDir });
    try {
      const get = requester(app.baseUrl);
      const staff = await sessionCookie(targets.staffUserId, app.secret);
      const staticPath = await staticFilePath(BENCH_DIST_DIR);
      const staticFile = { name: "static file", run: async () => void (await get({ path: staticPath })) };
      const v = targets.vendorSlug;
      const pages = [
        {
          key: "sheet",
          label: "sheet-page/static",
          name: "Library sheet page",
          request: { path: `/${v}/library/${targets.sheetSlug}` },
          goal: { p95: 1.5 },
        },
        {
          key: "search",
          label: "search-api/static",
          name: "search API",
          request: { path: `/api/v1/vendors/${v}/search?q=${encodeURIComponent("1/8 acrylic slot")}` },
        },
        { key: "desk", label: "desk-queue/static", name: "Desk queue", request: { path: `/${v}/desk`, cookie: staff } },
        {
          key: "thread",
          label: "ticket-thread/static",
          name: "ticket thread",
          request: { path: `/${v}/desk/tickets/${targets.threadTicketId}`, cookie: staff },
        },
      ].filter((p) => only.has(p.key));
      for (const page of pages) {
        for (let i = 0; i < 5; i++) await get(page.request); // warm-up: compile caches, fill pools, first render
        const [subject, baseline] = await runBlocks({
          kinds: [{ name: page.name, run: async () => void (await get(page.request)) }, staticFile],
          clients,
          perBlock,
          blocks,
          maxSeconds: seconds,
        });
        reportRatio(page.label, summarize(subject), summarize(baseline), page.goal);
      }
      if (only.has("calculate")) {
        const calculate = { path: "/api/v1/calculate", method: "POST" as const, body: CALCULATE_BODY };
        for (let i = 0; i < 5; i++) await get(calculate);
        const [subject, baseline] = await runBlocks({
          kinds: [
            { name: "POST /api/v1/calculate", run: async () => void (await get(calculate)) },
            { name: "GET /api/health", run: async () => void (await get({ path: "/api/health" })) },
          ],
          clients: 10,
          perBlock: perBlock * 5,
          blocks,
          maxSeconds: seconds,
        });
        reportRatio("calculate/health", summarize(subject), summarize(baseline), { throughput: 0.9 });
      }
      if (only.has("sheet")) {
        const js = await pageJavaScript(app.baseUrl, `/${v}/library/${targets.sheetSlug}`);
        const kb = js.compressed / 1024;
        console.log(
          `\nLibrary sheet page JavaScript: ${js.chunks} chunks, ${(js.raw / 1024).toFixed(0)} KB raw, ${kb.toFixed(0)} KB gzip (goal ≤ ${SHEET_JS_GOAL_KB} KB: ${kb <= SHEET_JS_GOAL_KB ? "met" : "not met"}; ${js.skippedNoModule} noModule polyfill chunk(s) not counted)`,
        );
        // The same build's not-found page has no client code of its own: what the sheet page adds to the framework.
        const floor = await pageJavaScript(app.baseUrl, `/${v}/library/no-such-sheet-${Date.now()}`);
        console.log(
          `not-found page JavaScript (framework and root layout only): ${(floor.compressed / 1024).toFixed(1)} KB gzip; the sheet page adds ${((js.compressed - floor.compressed) / 1024).toFixed(1)} KB`,
        );
        console.log(`sheet page/not-found page JavaScript ratio: ${(js.compressed / floor.compressed).toFixed(2)}`);
      }
    } finally {
      await app.stop();
    }
  });
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.stack : error);
  process.exitCode = 1;
});
