// Measuring: the Field-results code under test loaded against the bench database, timed per query and per page.
import type { Knex } from "knex";

import { prng } from "../prng";
import { fmt, PHASE_BUDGET_MS, Z, type Samples, type SheetPick } from "./shape";

/** lib/db/knex reads DATABASE_URL when it is first imported, so set it before importing anything that uses it. */
export async function loadFieldModules(databaseUrl: string) {
  process.env.DATABASE_URL = databaseUrl;
  process.env.JOBS_WORKER = "off";
  const [{ db }, refresh, summary, attention, changes, coverage, sheet] = await Promise.all([
    import("../../../lib/db/knex"),
    import("../../../lib/field/refresh-rollups"),
    import("../../../lib/field/field-summary"),
    import("../../../lib/field/needs-attention"),
    import("../../../lib/field/customer-changes"),
    import("../../../lib/field/coverage"),
    import("../../../lib/field/sheet-field-results"),
  ]);
  const overview: Record<string, (vendorId: string) => Promise<unknown>> = {
    getFieldSummary: (vendorId) => summary.getFieldSummary({ vendorId }),
    listNeedsAttention: (vendorId) => attention.listNeedsAttention({ vendorId, z: Z, limit: 25 }),
    listCustomerChanges: (vendorId) => changes.listCustomerChanges({ vendorId, limit: 25 }),
    getCoverageGaps: (vendorId) => coverage.getCoverageGaps({ vendorId }),
  };
  const drillIn = (pick: SheetPick) => sheet.findSheetFieldResults({ vendorId: pick.vendorId, sheetId: pick.sheetId, z: Z });
  return { db, refreshFieldRollups: refresh.refreshFieldRollups, overview, drillIn };
}

export type Field = Awaited<ReturnType<typeof loadFieldModules>>;

export async function timeIt(samples: Samples, name: string, run: () => Promise<unknown>) {
  const started = performance.now();
  await run();
  const ms = performance.now() - started;
  if (!samples.has(name)) samples.set(name, []);
  samples.get(name)!.push(ms);
  return ms;
}

/** Runs `body(i)` up to `iterations` times or until the phase budget is spent. */
export async function phase(iterations: number, body: (i: number) => Promise<void>) {
  const deadline = performance.now() + PHASE_BUDGET_MS;
  for (let i = 0; i < iterations && performance.now() < deadline; i++) await body(i);
}

export async function loadDrillInSheets(knex: Knex, count: number): Promise<SheetPick[]> {
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

export async function measure(field: Field, vendorIds: string[], sheets: SheetPick[], iterations: number) {
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
    await timeIt(samples, "page    overview (all four in parallel)", () =>
      Promise.all(names.map((n) => timeIt(samples, `in page ${n}`, () => field.overview[n](vendorId)))),
    );
  });
  await phase(iterations, async (i) => {
    await timeIt(samples, "page    drill-in findSheetFieldResults", () => field.drillIn(sheets[i % sheets.length]));
  });
  return samples;
}

export type RefreshFigures = { outcomes: number; rebuildMs: number; oneReportMs: number };

export const ONE_REPORT_RUNS = 5;

/**
 * The bulk load ran with triggers off, so the rollups start with a full rebuild (what every refresh cost
 * before); then, ONE_REPORT_RUNS times, one new outcome report on a random version and the refresh the job runs.
 */
export async function measureRefresh(knex: Knex, field: Field, outcomes: number): Promise<RefreshFigures> {
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
