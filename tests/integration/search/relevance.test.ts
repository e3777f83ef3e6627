import { beforeAll, describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { createPostgresEngine } from "@/search/engines/postgres/postgres-engine";
import { reindexVendor } from "@/search/indexing/reindex";
import { runSearch } from "@/search/run/run-search";
import { runSeeds } from "@/seeds/run-seeds";

import { RELEVANCE_CASES } from "./relevance-cases";

const engine = createPostgresEngine(db);
let vendors: Record<string, string> = {};

beforeAll(async () => {
  const ids = await runSeeds(db, { reset: true });
  vendors = ids.vendors;
  for (const id of Object.values(vendors)) await reindexVendor({ engine, vendorId: id });
}, 120_000);

describe("relevance table over the demo data (PostgreSQL engine)", () => {
  it("has at least 30 cases", () => expect(RELEVANCE_CASES.length).toBeGreaterThanOrEqual(30));

  it.each(RELEVANCE_CASES)("$vendor: “$q” puts $expect in the top $top ($why)", async ({ vendor, q, expect: slug, top }) => {
    const result = await runSearch(engine, { vendorId: vendors[vendor], q });
    const slugs = result.hits.map((h) => h.slug);
    expect(slugs.slice(0, top), `hits: ${slugs.slice(0, 5).join(", ")}`).toContain(slug);
  });

  it("answers garbage, SQL-looking and very long input without an error", async () => {
    for (const q of ["'; drop table sheets; --", "%%%___\\\\", "a".repeat(5000), "🙂🙂 ∅ ø ⌀", "1/0 0/0 -1mm 99999 in", "' or 1=1 --"]) {
      const result = await runSearch(engine, { vendorId: vendors.northbeck, q });
      expect(result.total).toBeGreaterThanOrEqual(0);
    }
  });
});
