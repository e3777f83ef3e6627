import { describe, expect, it } from "vitest";

import type { EngineQuery } from "@/search/engines/engine-types";
import { buildFirstMatchingStepSql, buildKnownStepSql, buildSearchSql } from "@/search/engines/postgres/pg-search-sql";
import { widestConditions } from "@/search/engines/postgres/pg-widest";
import { numberPlaceholders } from "@/search/engines/postgres/prepared-query";
import { compose, frag } from "@/search/engines/postgres/sql-fragment";
import { buildTsQuery, lexemeOf, typoWords } from "@/search/engines/postgres/ts-query";

const vendorId = "0b6f1c9e-1111-4222-8333-944455556666";
const base = { vendorId, words: [], filters: {}, boosts: {}, page: 1, perPage: 20 };
const placeholders = (sql: string) => (sql.replace(/\?\?/g, "").match(/\?/g) ?? []).length;

describe("tsquery text", () => {
  it("ORs the words and alternatives, quotes each lexeme and makes the last word a prefix", () => {
    expect(buildTsQuery(["jig", "letters"], ["plexi"], "lett")).toBe("'jig' | 'letters' | 'plexi' | 'lett':*");
  });

  it("keeps nothing that to_tsquery would read as syntax", () => {
    expect(lexemeOf("a'b|c&!(d)")).toBe("abcd");
    expect(lexemeOf("Café")).toBe("cafe");
    expect(lexemeOf("--nb-sf-3175..")).toBe("nb-sf-3175");
    expect(buildTsQuery(["'", "&|!"], [])).toBeNull();
    expect(buildTsQuery([], [], "a")).toBeNull();
  });

  it("sends only words of five letters or more, and no numbers, to trigram matching", () => {
    expect(typoWords(["alumnium", "mdf", "3.175", "1/8", "plywod"], 5)).toEqual(["alumnium", "plywod"]);
  });
});

describe("the search statement", () => {
  it("binds the vendor first and every value as a parameter", () => {
    const { sql, bindings } = buildSearchSql({
      ...base,
      words: ["x'); drop table sheets; --"],
      filters: { materialKeys: ["acrylic"], diameterMm: 3.175 },
      boosts: { skus: ["NB-SF-3175"] },
    });
    expect(sql).not.toContain("drop table");
    expect(placeholders(sql)).toBe(bindings.length);
    expect(sql).toMatch(/d\.vendor_id = \?/);
    expect(bindings).toContain(vendorId);
    expect(bindings).toContainEqual(["acrylic"]);
    // Diameter filter within ±0.01 mm.
    expect(bindings).toContain(3.165);
    expect(bindings.some((b) => typeof b === "number" && Math.abs(b - 3.185) < 1e-9)).toBe(true);
  });

  it("requires a text match only when there is no filter", () => {
    expect(buildSearchSql({ ...base, words: ["jig"] }).sql).toContain("and (d.search_vector @@ q.tsq)");
    expect(buildSearchSql({ ...base, words: ["jig"], filters: { flutes: 2 } }).sql).not.toContain("and (d.search_vector @@ q.tsq)");
  });

  it("pages with limit and offset", () => {
    const { bindings } = buildSearchSql({ ...base, page: 3, perPage: 10 });
    const i = bindings.indexOf(10);
    expect(bindings[i + 1]).toBe(20);
  });
});

describe("sql fragments", () => {
  it("keeps bindings in placeholder order", () => {
    expect(compose("a $2 b $1", frag("?", 1), frag("? ?", 2, 3))).toEqual({ sql: "a ? ? b ?", bindings: [2, 3, 1] });
  });
});

describe("the steps after the first in one statement", () => {
  const step = (filters: EngineQuery["filters"]): EngineQuery => ({
    vendorId: "00000000-0000-4000-8000-000000000001",
    words: ["jig"],
    alternatives: [],
    boosts: {},
    filters,
    page: 1,
    perPage: 20,
  });

  it("marks each document with the first step it meets and answers the lowest mark, else the last step", () => {
    const steps = [step({ diameterMm: 3.175 }), step({})];
    const { sql, bindings } = buildFirstMatchingStepSql(steps);
    expect(sql).toMatch(/case when d\.diameter_mm between \? and \? then 0 when \(d\.search_vector @@ q\.tsq\) then 1 end as step/);
    expect(sql).toContain("chosen as (select coalesce(min(step), 1) as step from marked)");
    // The first step has a filter, the last only words: the bound is either.
    expect(sql).toContain("(d.diameter_mm between ? and ? or (d.search_vector @@ q.tsq))");
    expect(placeholders(sql)).toBe(bindings.length);
    expect(bindings.filter((b) => b === steps[0].vendorId).length).toBeGreaterThanOrEqual(3);
  });

  it("marks documents by id alone and reads the answered step's documents again, within the vendor", () => {
    const { sql } = buildFirstMatchingStepSql([step({ flutes: 2 }), step({})]);
    expect(sql).toMatch(/marked as \(select \* from \(select d\.doc_id, case .* end as step from search_documents d /);
    expect(sql).not.toMatch(/marked as [^\n]*search_vector,/);
    expect(sql).toContain("from marked l join search_documents d on d.vendor_id = ? and d.doc_id = l.doc_id");
  });

  it("has no bound when a step takes everything (no filter and nothing typed)", () => {
    const bare = (filters: EngineQuery["filters"]): EngineQuery => ({ ...step(filters), words: [] });
    const { sql } = buildFirstMatchingStepSql([bare({ flutes: 2 }), bare({})]);
    expect(sql).toContain("case when d.flutes = ? then 0 when true then 1 end as step");
    expect(sql).toMatch(/from search_documents d cross join q where d\.vendor_id = \? and d\.kind = 'sheet'\) as l/);
  });
});

describe("a step known to answer first", () => {
  const query: EngineQuery = { ...base, words: ["jig"], filters: { flutes: 2 } };

  it("is the step's own statement, searched only while the vendor's index version is the one given", () => {
    const own = buildSearchSql(query).sql;
    const { sql, bindings } = buildKnownStepSql(query, "41");
    expect(sql).toContain(
      "seen as (select coalesce((select v.version from search_index_versions v where v.vendor_id = ?), 0)::text as version)",
    );
    expect(own).toContain("where d.vendor_id = ? and d.kind = 'sheet' and d.flutes = ?),");
    expect(sql).toContain("where d.vendor_id = ? and d.kind = 'sheet' and d.flutes = ? and (select version from seen) = ?::text),");
    expect(sql).toContain("select (select version from seen) as version, (select count(*)::int from matched) as total");
    expect(placeholders(sql)).toBe(bindings.length);
    expect(bindings).toContain("41");
  });

  it("leaves the first step's own statement without the version", () => {
    expect(buildSearchSql(query).sql).not.toContain("search_index_versions");
    expect(buildFirstMatchingStepSql([query, { ...query, filters: {} }]).sql).toContain("(select version from seen) as version");
  });
});

describe("the widest bound of relaxed steps", () => {
  it("keeps a part every step has, at its widest", () => {
    const conds = widestConditions([
      { materialKeys: ["acrylic-cast"], operations: ["slotting", "profile"], diameterMm: 3.175, flutes: 1 },
      { materialKeys: ["acrylic", "acrylic-cast"], operations: ["slotting"], diameterMm: 3 },
      { materialGroups: ["plastics"], operations: ["slotting", "pocket"], diameterMm: 3.175, flutes: 2 },
    ]);
    expect(conds.map((c) => c.sql)).toEqual([
      "(d.material_key = any(?::text[]) or d.material_group = any(?::text[]))",
      "d.operations @> ?::text[]",
      "d.diameter_mm between ? and ?",
    ]);
    expect(conds[0].bindings).toEqual([["acrylic-cast", "acrylic"], ["plastics"]]);
    expect(conds[1].bindings).toEqual([["slotting"]]);
    expect(conds[2].bindings[0]).toBeCloseTo(2.99);
    expect(conds[2].bindings[1]).toBeCloseTo(3.185);
  });

  it("drops a part some step lacks, and operations no step shares", () => {
    expect(
      widestConditions([
        { flutes: 2, operations: ["ramp"] },
        { cornerForms: ["ball"], operations: ["slotting"] },
      ]),
    ).toEqual([]);
    expect(widestConditions([{ flutes: 2 }, { flutes: 3 }]).map((c) => c.bindings)).toEqual([[[2, 3]]]);
  });
});

describe("placeholders", () => {
  it("numbers them in order and sends a repeated text or array once, never a repeated number", () => {
    const native = numberPlaceholders("a = ? and b = any(?) and c = ? and d = ? and e = ? and f = any(?)", ["v", ["x"], 2, "v", 2, ["x"]]);
    expect(native).toEqual({ text: "a = $1 and b = any($2) and c = $3 and d = $1 and e = $4 and f = any($2)", values: ["v", ["x"], 2, 2] });
  });

  it("leaves identifier and escaped placeholders to knex, and refuses a count that does not match", () => {
    expect(numberPlaceholders("select ?? from t", ["a"])).toBeUndefined();
    expect(() => numberPlaceholders("a = ? and b = ?", [1])).toThrow();
    expect(() => numberPlaceholders("a = ?", [1, 2])).toThrow();
  });
});
