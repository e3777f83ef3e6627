import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";

import { buildCutterDocument } from "@/search/document/build-sheet-document";
import type { SearchDocument } from "@/search/document/document-schema";
import type { EngineQuery, SearchEngine } from "@/search/engines/engine-types";
import { sheetDoc } from "@/tests/unit/search/document/document-fixture";

const acrylic = { slug: "cast-acrylic", name: "Cast acrylic", group: "plastics", synonyms: ["PMMA"] };
const mdf = { slug: "mdf", name: "MDF", group: "wood", synonyms: [] };
const alu = { slug: "aluminium-6061", name: "Aluminium 6061", group: "non-ferrous", synonyms: [] };

/**
 * What every engine must do, on the same small catalogue of two vendors. Runs against PostgreSQL
 * always and against a real Meilisearch when MEILISEARCH_HOST is set.
 */
export function defineEngineContract(name: string, makeEngine: () => Promise<SearchEngine> | SearchEngine) {
  describe(`search engine contract: ${name}`, () => {
    const a = randomUUID();
    const b = randomUUID();
    let engine: SearchEngine;
    let docs: Record<string, SearchDocument>;
    const q = (over: Partial<EngineQuery>): EngineQuery => ({
      vendorId: a,
      words: [],
      filters: {},
      boosts: {},
      page: 1,
      perPage: 20,
      ...over,
    });
    const ids = async (over: Partial<EngineQuery>) => (await engine.search(q(over))).hits.map((h) => h.doc.id).sort();

    beforeAll(async () => {
      engine = await makeEngine();
      await engine.configure();
      docs = {
        acrylic18: sheetDoc({ vendorId: a, slug: "acrylic-18", title: "Cast acrylic, 1/8 in single flute", material: acrylic }),
        acrylic14: sheetDoc({
          vendorId: a,
          slug: "acrylic-14",
          title: "Cast acrylic, 1/4 in single flute",
          material: acrylic,
          diameterMm: 6.35,
          sku: "T-SF-6350",
        }),
        mdf6: sheetDoc({
          vendorId: a,
          slug: "mdf-6",
          title: "MDF, 6 mm two-flute",
          material: mdf,
          diameterMm: 6,
          flutes: 2,
          sku: "T-2F-6",
          kinds: ["pocket", "profile"],
          geometry: "upcut",
        }),
        alu6: sheetDoc({
          vendorId: a,
          slug: "alu-6",
          title: "Aluminium 6061, 6 mm three-flute",
          material: alu,
          diameterMm: 6,
          flutes: 3,
          sku: "T-3F-6",
          kinds: ["constant-engagement", "slotting"],
          geometry: "straight",
        }),
        otherVendor: sheetDoc({ vendorId: b, slug: "b-acrylic", title: "Cast acrylic, 1/8 in single flute zebrawood", material: acrylic }),
      };
      const cutter = buildCutterDocument(a, {
        id: docs.mdf6.cutterId,
        sku: "T-2F-6",
        name: "6 mm two-flute up-cut",
        diameterMm: 6,
        flutes: 2,
        cornerForm: "square",
        geometry: "upcut",
      });
      await engine.replaceVendor(a, [docs.acrylic18, docs.acrylic14, docs.mdf6, docs.alu6, cutter]);
      await engine.replaceVendor(b, [docs.otherVendor]);
    });

    it("finds a document by a word of its title", async () => {
      expect(await ids({ words: ["aluminium"] })).toEqual([docs.alu6.id]);
    });

    it("never returns another vendor's documents", async () => {
      expect(await ids({ words: ["zebrawood"] })).toEqual([]);
      const all = await engine.search(q({}));
      expect(all.hits.every((h) => h.doc.vendorId === a)).toBe(true);
      expect(all.total).toBe(4);
      expect(await ids({ vendorId: b })).toEqual([docs.otherVendor.id]);
    });

    it("filters by material keys, operations (all of them), flutes and diameter within the tolerance", async () => {
      expect(await ids({ filters: { materialKeys: ["acrylic", "acrylic-cast"] } })).toEqual([docs.acrylic18.id, docs.acrylic14.id].sort());
      expect(await ids({ filters: { operations: ["slotting", "constant-engagement"] } })).toEqual([docs.alu6.id]);
      expect(await ids({ filters: { flutes: 2 } })).toEqual([docs.mdf6.id]);
      expect(await ids({ filters: { diameterMm: 3.18 } })).toEqual([docs.acrylic18.id]);
      expect(await ids({ filters: { diameterMm: 3.2 } })).toEqual([]);
      expect(await ids({ filters: { diameterMm: 6, materialGroups: ["wood"] } })).toEqual([docs.mdf6.id]);
    });

    it("counts facets over the matches", async () => {
      const { facets } = await engine.search(q({ filters: { diameterMm: 6 } }));
      expect(facets.flutes).toEqual(
        expect.arrayContaining([
          { value: "2", count: 1 },
          { value: "3", count: 1 },
        ]),
      );
      expect(facets.operations).toEqual(
        expect.arrayContaining([
          { value: "slotting", count: 1 },
          { value: "pocket", count: 1 },
        ]),
      );
      expect(facets.materialGroup?.find((f) => f.value === "plastics")).toBeUndefined();
    });

    it("pages the hits and reports the total", async () => {
      const first = await engine.search(q({ perPage: 3 }));
      const second = await engine.search(q({ perPage: 3, page: 2 }));
      expect(first.total).toBe(4);
      expect(first.hits).toHaveLength(3);
      expect(second.hits).toHaveLength(1);
      expect(new Set([...first.hits, ...second.hits].map((h) => h.doc.id)).size).toBe(4);
    });

    it("finds the cutter by its SKU", async () => {
      const { cutters } = await engine.search(q({ words: ["t-2f-6"], boosts: { skus: ["T-2F-6"] } }));
      expect(cutters.map((c) => c.cutterSku)).toEqual(["T-2F-6"]);
    });

    it("removes documents only within the vendor, and an upsert replaces by id", async () => {
      await engine.remove(b, [docs.acrylic14.id]);
      expect(await ids({ filters: { diameterMm: 6.35 } })).toEqual([docs.acrylic14.id]);
      await engine.remove(a, [docs.acrylic14.id]);
      expect(await ids({ filters: { diameterMm: 6.35 } })).toEqual([]);
      await engine.upsert(a, [{ ...docs.acrylic18, title: "Cast acrylic, renamed" }]);
      const hit = (await engine.search(q({ filters: { diameterMm: 3.175 } }))).hits;
      expect(hit.map((h) => h.doc.title)).toEqual(["Cast acrylic, renamed"]);
    });
  });
}
