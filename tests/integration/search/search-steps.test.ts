import { afterEach, beforeAll, describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import type { SearchEngine } from "@/search/engines/engine-types";
import { createPostgresEngine } from "@/search/engines/postgres/postgres-engine";
import { reindexVendor } from "@/search/indexing/reindex";
import { engineQueriesFor, runSearch } from "@/search/run/run-search";
import { runSeeds } from "@/seeds/run-seeds";

import { RELEVANCE_CASES } from "./relevance-cases";

// The steps of a search (the first step's statement; when it matches nothing, the later steps in one statement;
// every step in one statement when the same search relaxed last time) must answer exactly what running the steps
// one by one answers.
const engine = createPostgresEngine(db);
const stepByStep: SearchEngine = { ...engine, searchSteps: undefined };
let vendors: Record<string, string> = {};

// Relaxing queries (nothing matches every part), filters, pages, an empty box, words only, nonsense.
const EXTRA = [
  "1/8 2F acrylic slot",
  "12 mm 4 flute brass ball nose ramp",
  "1/2 compression mdf slot",
  "3mm 3 flute plywood",
  "alumnium 6mm 2 flute",
  "",
  "jig",
  "xyzzy plugh",
  "6 mm",
  "ball",
  "polycarbonate 1/4 2F profile",
  "plastics 1/8 4 flute",
  "oak",
  "NB-SF",
];

beforeAll(async () => {
  const ids = await runSeeds(db, { reset: true });
  vendors = ids.vendors;
  for (const id of Object.values(vendors)) await reindexVendor({ engine, vendorId: id });
}, 120_000);

afterEach(() => {
  delete process.env.DATABASE_POOL_MODE;
});

const requests = () => [
  ...RELEVANCE_CASES.map((c) => ({ vendorId: vendors[c.vendor], q: c.q })),
  ...Object.values(vendors).flatMap((vendorId) => EXTRA.map((q) => ({ vendorId, q }))),
  { vendorId: vendors.northbeck, q: "acrylic", filters: { flutes: 2 } },
  { vendorId: vendors.northbeck, q: "1/8 slot", filters: { materialGroup: "wood" as const } },
  { vendorId: vendors.northbeck, q: "mdf", page: 2, perPage: 2 },
];

describe("search steps in one or two statements (PostgreSQL)", () => {
  it("answers what the steps run one by one answer: step, total, hits in order, facets, cutters", async () => {
    let relaxedSeen = 0;
    for (const req of requests()) {
      const [one, again, each] = [await runSearch(engine, req), await runSearch(engine, req), await runSearch(stepByStep, req)];
      expect(one, `“${req.q}”`).toEqual(each);
      expect(again, `“${req.q}” again`).toEqual(each);
      if (one.relaxed.length > 0) relaxedSeen++;
    }
    // The list must exercise relaxation, or the comparison proves little.
    expect(relaxedSeen).toBeGreaterThan(3);
  });

  it("runs the first step's own statement first and the later steps only when it matched nothing", async () => {
    const matching = engineQueriesFor({ vendorId: vendors.northbeck, q: "acrylic" }).steps.map((s) => s.query);
    const atOnce = await engine.searchSteps!(matching);
    expect(atOnce.step).toBe(0);
    expect(atOnce.roundTrips).toBe(1);
    expect(atOnce.result).toEqual(await engine.search(matching[0]));

    const relaxing = engineQueriesFor({ vendorId: vendors.northbeck, q: "1/8 2F acrylic slot" }).steps.map((s) => s.query);
    const later = await engine.searchSteps!(relaxing);
    expect(later.step).toBeGreaterThan(0);
    expect(later.roundTrips).toBe(2);
    expect(later.result.total).toBeGreaterThan(0);
    expect(later.result).toEqual(await engine.search(relaxing[later.step]));
  });

  it("runs a search that relaxed last time as the step that answered, until the vendor's index changes", async () => {
    const vendorId = vendors.northbeck;
    const relaxing = engineQueriesFor({ vendorId, q: "1/8 2F acrylic slot" }).steps.map((s) => s.query);
    const shapeKey = "steps-test: 1/8 2F acrylic slot";
    const first = await engine.searchSteps!(relaxing, shapeKey);
    expect(first.roundTrips).toBe(2);
    expect(first.step).toBeGreaterThan(0);
    const next = await engine.searchSteps!(relaxing, shapeKey);
    expect(next.roundTrips).toBe(1);
    expect({ step: next.step, result: next.result }).toEqual({ step: first.step, result: first.result });

    // A document that meets every part now exists: the index moved on, so every step runs again and the first answers.
    const { doc } = first.result.hits[0];
    const meetsAll = { ...doc, id: `sheet-${"0".repeat(8)}-0000-4000-8000-${"0".repeat(12)}`, flutes: 2, diameterMm: 3.175 };
    const filters = relaxing[0].filters;
    meetsAll.operations = [...new Set([...meetsAll.operations, ...(filters.operations ?? [])])];
    meetsAll.materialKey = filters.materialKeys?.[0] ?? meetsAll.materialKey;
    const versionOf = async () => (await db("search_index_versions").where({ vendor_id: vendorId }).first())?.version;
    const before = await versionOf();
    await engine.upsert(vendorId, [meetsAll]);
    expect(await versionOf()).not.toBe(before);
    try {
      const now = await engine.searchSteps!(relaxing, shapeKey);
      expect(now.step).toBe(0);
      expect(now.roundTrips).toBe(2);
      expect(now.result).toEqual(await engine.search(relaxing[0]));
      expect(now.result.hits.map((h) => h.doc.id)).toContain(meetsAll.id);
      // Matched at once, it runs the first step's own statement again.
      expect((await engine.searchSteps!(relaxing, shapeKey)).roundTrips).toBe(1);
    } finally {
      await engine.remove(vendorId, [meetsAll.id]);
    }
  });

  it("runs the same statements unnamed behind a pooler in transaction mode", async () => {
    const req = { vendorId: vendors.northbeck, q: "1/8 2F acrylic slot" };
    const named = await runSearch(engine, req);
    process.env.DATABASE_POOL_MODE = "transaction";
    const unnamed = await runSearch(engine, req);
    expect(unnamed).toEqual(named);
    expect(named.relaxed).toContain("flutes");
    expect(named.total).toBeGreaterThan(0);
  });
});
