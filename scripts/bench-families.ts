// Benchmark of sheet families at catalogue scale, in a throwaway database (never the dev database):
//   · the preview of a 1,000-cell family (100 cutters × 10 materials × 1 machine class), before and after its sheets exist;
//   · generating a 15,000-cell family (500 cutters × 10 materials × 3 machine classes) as the job does, chunk by chunk;
//   · approving and publishing that batch, each in one transaction through the single-sheet steps.
// Each phase prints its time and the process's peak memory (RSS and JS heap, sampled every 20 ms). Figures are
// printed, never judged. Run: npm run bench:families -- [--cutters 500] [--preview-runs 5]
import type { Knex } from "knex";

import { arg } from "./lib/bench-args";
import { withBenchDatabase } from "./lib/bench-database";

const GEOMETRIES = [
  ["single-flute", 1],
  ["o-flute", 1],
  ["upcut", 2],
  ["downcut", 2],
  ["compression", 2],
  ["straight", 3],
] as const;
const SIZES = [3, 3.175, 4, 5, 6, 6.35, 8, 10, 12];
// Invented bench materials: slug, group, vc window m/min, minimum chip mm, kc N/mm².
const MATERIALS = [
  ["cast-acrylic", "plastics", 150, 300, 0.05, 120],
  ["hdpe", "plastics", 200, 450, 0.08, 60],
  ["polycarbonate", "plastics", 150, 300, 0.05, 130],
  ["mdf", "wood", 200, 700, 0.06, 60],
  ["plywood", "wood", 200, 650, 0.05, 70],
  ["hard-maple", "wood", 200, 600, 0.05, 95],
  ["aluminium-6061", "non-ferrous", 150, 400, 0.02, 700],
  ["abs", "plastics", 150, 350, 0.05, 90],
  ["g10", "composites", 100, 250, 0.03, 250],
  ["cfrp", "composites", 100, 250, 0.03, 280],
] as const;
const CLASSES = [
  ["light-router", 8000, 24000, 0.8, 5000, 0.4, 150],
  ["medium-router", 6000, 24000, 1.5, 8000, 0.55, 250],
  ["rigid-router", 6000, 24000, 2.2, 15000, 0.7, 400],
] as const;

type Peak = { rssMb: number; heapMb: number };

/** Runs `work`, sampling memory; answers its time and the peaks. */
async function measure<T>(label: string, work: () => Promise<T>): Promise<T> {
  const peak: Peak = { rssMb: 0, heapMb: 0 };
  const sample = () => {
    const m = process.memoryUsage();
    peak.rssMb = Math.max(peak.rssMb, m.rss / 2 ** 20);
    peak.heapMb = Math.max(peak.heapMb, m.heapUsed / 2 ** 20);
  };
  const timer = setInterval(sample, 20);
  const start = performance.now();
  try {
    const result = await work();
    sample();
    console.log(
      `${label.padEnd(44)} ${((performance.now() - start) / 1000).toFixed(2).padStart(8)} s   peak RSS ${peak.rssMb.toFixed(0)} MB, peak heap ${peak.heapMb.toFixed(0)} MB`,
    );
    return result;
  } finally {
    clearInterval(timer);
  }
}

async function seedCatalogue(knex: Knex, cutters: number) {
  const [{ id: vendorId }] = await knex("vendors")
    .insert({ slug: "bench-families", name: "Bench families vendor", settings: "{}" })
    .returning("id");
  const users = await knex("users")
    .insert([
      { email: "eng1@bench.test", name: "Bench engineer 1" },
      { email: "eng2@bench.test", name: "Bench engineer 2" },
    ])
    .returning("id");
  await knex("members").insert(users.map((u) => ({ vendor_id: vendorId, user_id: u.id, role: "engineer" })));
  const rows = Array.from({ length: cutters }, (_, i) => {
    const [geometry, z] = GEOMETRIES[i % GEOMETRIES.length];
    const d = SIZES[Math.floor(i / GEOMETRIES.length) % SIZES.length];
    return {
      vendor_id: vendorId,
      sku: `BF-${String(i).padStart(4, "0")}`,
      name: `${d} mm ${z}-flute ${geometry} cutter no. ${i}`,
      diameter_mm: d,
      flutes: z,
      flute_length_mm: d * 3,
      overall_length_mm: Math.max(50, d * 8),
      shank_mm: d,
      geometry,
      short_code: `bf${i}`,
    };
  });
  for (let i = 0; i < rows.length; i += 500) await knex("cutters").insert(rows.slice(i, i + 500));
  const materials = await knex("materials")
    .insert(
      MATERIALS.map(([slug, group, lo, hi, chip, kc]) => ({
        vendor_id: vendorId,
        slug,
        name: slug,
        material_group: group,
        vc_min_mpm: lo,
        vc_max_mpm: hi,
        min_chip_load_mm: chip,
        kc_nmm2: kc,
      })),
    )
    .returning("id");
  const classes = await knex("machine_classes")
    .insert(
      CLASSES.map(([slug, lo, hi, kw, feed, rigidity, thrust]) => ({
        vendor_id: vendorId,
        slug,
        name: slug,
        rpm_min: lo,
        rpm_max: hi,
        power_kw: kw,
        max_feed_mm_min: feed,
        rigidity,
        z_thrust_n: thrust,
      })),
    )
    .returning("id");
  return {
    vendorId,
    engineer: users[0].id as string,
    reviewer: users[1].id as string,
    materialIds: materials.map((m) => m.id as string),
    classIds: classes.map((k) => k.id as string),
  };
}

/** lib/db/knex reads DATABASE_URL when it is first imported, so set it before importing anything that uses it. */
async function loadModules(url: string) {
  process.env.DATABASE_URL = url;
  process.env.JOBS_WORKER = "off";
  const [{ db }, save, preview, start, generate, approve, publish, boss, rules] = await Promise.all([
    import("../lib/db/knex"),
    import("../lib/families/save-family"),
    import("../lib/families/preview-family"),
    import("../lib/families/start-generation"),
    import("../lib/families/generate-batch"),
    import("../lib/families/approve-batch"),
    import("../lib/families/publish-batch"),
    import("../lib/jobs/boss"),
    import("../content-schema/family"),
  ]);
  return { db, ...save, ...preview, ...start, ...generate, ...approve, ...publish, getBoss: boss.getBoss, ...rules };
}

async function run(url: string, knex: Knex) {
  const cutters = arg("cutters", 500, 5000);
  const previewRuns = arg("preview-runs", 5, 50);
  const seeded = await seedCatalogue(knex, cutters);
  const m = await loadModules(url);
  const rules = m.familyRulesSchema.parse({ kinds: ["slotting", "profile"], rules: [] });
  const definition = (slug: string, classIds: string[], skus: string[] = []) => ({
    name: slug,
    slug,
    cutters: { geometries: [], skus },
    materialIds: seeded.materialIds,
    machineClassIds: classIds,
  });
  const { vendorId, engineer, reviewer } = seeded;
  const previewCells = Math.min(100, cutters) * MATERIALS.length;
  const smallSkus = Array.from({ length: Math.min(100, cutters) }, (_, i) => `BF-${String(i).padStart(4, "0")}`);
  await m.createFamily({ vendorId, userId: engineer, definition: definition("preview-1000", [seeded.classIds[1]], smallSkus), rules });
  await m.createFamily({ vendorId, userId: engineer, definition: definition("catalogue", seeded.classIds), rules });

  const previewTimes = async (label: string) => {
    const times: number[] = [];
    for (let i = 0; i < previewRuns; i++) {
      const t = performance.now();
      const p = await m.previewFamily({ vendorId, slug: "preview-1000", rules });
      times.push(performance.now() - t);
      if (p.cells.length !== previewCells) throw new Error(`The preview family has ${p.cells.length} cells, not ${previewCells}.`);
    }
    times.sort((a, b) => a - b);
    console.log(
      `${`preview of ${previewCells} cells, ${label}`.padEnd(44)} median ${times[Math.floor(times.length / 2)].toFixed(0)} ms, slowest ${times.at(-1)!.toFixed(0)} ms (${previewRuns} runs)`,
    );
  };
  await previewTimes("no sheets yet");

  const batch = await m.startGeneration({ vendorId, userId: engineer, slug: "catalogue" });
  console.log(`generating ${batch.total} cells (${cutters} cutters × ${MATERIALS.length} materials × ${CLASSES.length} machine classes)`);
  const generated = await measure("generate (chunks of 250, as the job does)", () => m.generateBatch({ vendorId, batchId: batch.id }));
  const outcomes = await knex("family_batch_items")
    .where({ batch_id: batch.id })
    .groupBy("outcome")
    .select<{ outcome: string; n: number }[]>("outcome", knex.raw("count(*)::int as n"));
  console.log(`  ${generated.written} drafts written; ${outcomes.map((o) => `${o.outcome} ${o.n}`).join(", ")}`);
  const codes = await knex.raw(
    "select w->>'code' as code, count(*)::int as n from family_batch_items, jsonb_array_elements(warnings) w where batch_id = ? group by 1 order by 2 desc limit 5",
    [batch.id],
  );
  if (codes.rows.length)
    console.log(
      `  warnings behind the blocked cells: ${codes.rows.map((r: { code: string; n: number }) => `${r.code} ${r.n}`).join(", ")}`,
    );
  const approved = await measure("approve (one transaction)", () =>
    m.approveBatch({ vendorId, userId: reviewer, slug: "catalogue", number: batch.number }),
  );
  const published = await measure("publish (one transaction)", () =>
    m.publishBatch({ vendorId, userId: reviewer, slug: "catalogue", number: batch.number }),
  );
  console.log(`  ${approved.approved} approved, ${published.published} published`);
  await previewTimes("with their published sheets to diff");
  const again = await m.startGeneration({ vendorId, userId: engineer, slug: "catalogue" });
  const regenerated = await measure("regenerate with the same rules", () => m.generateBatch({ vendorId, batchId: again.id }));
  console.log(`  ${regenerated.written} drafts written (unchanged rules write none)`);
  await (await m.getBoss()).stop({ graceful: false, wait: true });
  await m.db.destroy();
}

withBenchDatabase({ prefix: "swarfbook_bench_families", poolMax: 4 }, run).catch((error: unknown) => {
  console.error(error instanceof Error ? error.stack : error);
  process.exitCode = 1;
});
