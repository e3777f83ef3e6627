import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";

import { buildMeiliFilter, quote, vendorFilter } from "@/search/engines/meilisearch/meili-filter";
import { meiliSettings } from "@/search/engines/meilisearch/meili-settings";
import { createMeilisearchEngine } from "@/search/engines/meilisearch/meilisearch-engine";
import { searchSettings } from "@/search/settings";

import { sheetDoc } from "../document/document-fixture";
import { startMeiliStub } from "./meili-stub-server";

let stub: Awaited<ReturnType<typeof startMeiliStub>>;
const vendorId = randomUUID();
const query = (over: object = {}) => ({ vendorId, words: [], filters: {}, boosts: {}, page: 1, perPage: 20, ...over });

beforeAll(async () => {
  stub = await startMeiliStub();
});
afterAll(() => stub.close());
beforeEach(() => {
  stub.requests.length = 0;
});

const engine = () => createMeilisearchEngine({ host: stub.host, apiKey: "test-key", indexUid: "sbk_test", timeoutMs: 2000 });

describe("Meilisearch engine against a loopback stub", () => {
  it("creates the index and applies the settings once, waiting on each task", async () => {
    const e = engine();
    await e.configure();
    await e.configure();
    const [create, settings] = stub.requests.filter((r) => r.method !== "GET");
    expect(create).toMatchObject({
      method: "POST",
      path: "/indexes",
      body: { uid: "sbk_test", primaryKey: "id" },
      auth: "Bearer test-key",
    });
    expect(settings.method).toBe("PATCH");
    expect(settings.path).toBe("/indexes/sbk_test/settings");
    expect(settings.body).toEqual(meiliSettings());
    // Each task was polled until it left "processing" (the stub answers processing once).
    const polled = stub.requests.filter((r) => r.method === "GET" && r.path.startsWith("/tasks/"));
    expect(polled.length).toBe(4);
    expect(stub.requests.filter((r) => r.method !== "GET")).toHaveLength(2);
  });

  it("maps the declared settings: attributes, two-way and one-way synonyms, typo budget", () => {
    const s = meiliSettings();
    expect(s.searchableAttributes).toEqual([...searchSettings.searchableAttributes]);
    expect(s.filterableAttributes).toEqual(expect.arrayContaining(["vendorId", "materialKey", "operations", "diameterMm", "flutes"]));
    expect(s.synonyms?.pmma).toEqual(expect.arrayContaining(["acrylic", "plexiglass"]));
    expect(s.synonyms?.acrylic).toContain("pmma");
    expect(s.synonyms?.oak).toContain("hardwood");
    expect(s.synonyms?.hardwood ?? []).not.toContain("oak");
    expect(s.typoTolerance).toEqual({
      enabled: true,
      minWordSizeForTypos: { oneTypo: 5, twoTypos: 9 },
      disableOnAttributes: ["cutterSku"],
      disableOnNumbers: true,
    });
  });

  it("writes documents under the vendor they are upserted for", async () => {
    const e = engine();
    const docs = [sheetDoc({ vendorId: randomUUID() }), sheetDoc()];
    await e.upsert(vendorId, docs);
    const add = stub.requests.find((r) => r.path === "/indexes/sbk_test/documents")!;
    expect(add.method).toBe("POST");
    expect(add.query.get("primaryKey")).toBe("id");
    expect((add.body as { vendorId: string; id: string }[]).map((d) => [d.id, d.vendorId])).toEqual(docs.map((d) => [d.id, vendorId]));
  });

  it("deletes only within the vendor", async () => {
    const e = engine();
    await e.remove(vendorId, ["sheet-1", 'x" OR vendorId EXISTS']);
    const del = stub.requests.find((r) => r.path === "/indexes/sbk_test/documents/delete")!;
    expect(del.body).toEqual({ filter: `vendorId = "${vendorId}" AND id IN ["sheet-1", "x\\" OR vendorId EXISTS"]` });
    stub.requests.length = 0;
    await e.replaceVendor(vendorId, [sheetDoc()]);
    expect(stub.requests.filter((r) => r.method === "POST").map((r) => r.path)).toEqual([
      "/indexes/sbk_test/documents/delete",
      "/indexes/sbk_test/documents",
    ]);
  });

  it("a failed task rejects the write, so the job retries", async () => {
    const e = engine();
    await e.configure();
    stub.failNextTask("internal");
    await expect(e.upsert(vendorId, [sheetDoc()])).rejects.toThrow(/failed/);
  });

  it("searches with the vendor filter, parsed filters and facets, and reads hits and facet counts", async () => {
    const doc = sheetDoc({ vendorId });
    stub.onSearch(() => ({
      results: [
        {
          indexUid: "sbk_test",
          hits: [{ ...doc, body: undefined, _rankingScore: 0.9 }],
          query: "jig",
          processingTimeMs: 1,
          hitsPerPage: 20,
          page: 1,
          totalPages: 1,
          totalHits: 1,
          facetDistribution: { operations: { slotting: 1, profile: 3 } },
        },
        { indexUid: "sbk_test", hits: [], query: "", processingTimeMs: 1, limit: 5, offset: 0, estimatedTotalHits: 0 },
      ],
    }));
    const result = await engine().search(
      query({
        words: ["jig"],
        filters: { materialKeys: ["acrylic", "acrylic-cast"], diameterMm: 3.175, operations: ["slotting"], flutes: 1 },
        boosts: { skus: ["T-SF-3175"] },
        page: 2,
        perPage: 10,
      }),
    );
    const body = stub.requests.find((r) => r.path === "/multi-search")!.body as { queries: Record<string, unknown>[] };
    expect(body.queries[0]).toMatchObject({
      indexUid: "sbk_test",
      q: "jig",
      filter: `vendorId = "${vendorId}" AND kind = "sheet" AND materialKey IN ["acrylic", "acrylic-cast"] AND operations = "slotting" AND diameterMm 3.165 TO 3.185 AND flutes = 1`,
      facets: [...searchSettings.facets],
      page: 2,
      hitsPerPage: 10,
    });
    expect(body.queries[1]).toMatchObject({ filter: `vendorId = "${vendorId}" AND kind = "cutter" AND cutterSku IN ["T-SF-3175"]` });
    expect(result.total).toBe(1);
    expect(result.hits[0].doc.id).toBe(doc.id);
    expect(result.facets.operations).toEqual([
      { value: "profile", count: 3 },
      { value: "slotting", count: 1 },
    ]);
  });
});

describe("filter expressions", () => {
  it("quotes values so none can close the string", () => {
    expect(quote('a"b\\')).toBe('"a\\"b\\\\"');
    expect(buildMeiliFilter(vendorId, "sheet", { machineClass: 'x" OR vendorId != "' })).toBe(
      `vendorId = "${vendorId}" AND kind = "sheet" AND machineClass = "x\\" OR vendorId != \\""`,
    );
  });

  it("refuses a vendor id that is not a UUID and numbers that are not finite", () => {
    expect(() => vendorFilter('1" OR 1=1')).toThrow();
    expect(() => buildMeiliFilter(vendorId, "sheet", { flutes: Number.NaN })).toThrow();
  });
});
