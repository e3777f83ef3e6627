import { describe, expect, it } from "vitest";

import type { EngineQuery } from "@/search/engines/engine-types";
import { buildSearchSql, buildSearchStepsSql } from "@/search/engines/postgres/pg-search-sql";
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
    const { sql, bindings } = buildSearchSql({ ...base, words: ["x'); drop table sheets; --"], filters: { materialKeys: ["acrylic"], diameterMm: 3.175 }, boosts: { skus: ["NB-SF-3175"] } });
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

describe("search steps in one statement", () => {
  const step = (filters: EngineQuery["filters"]): EngineQuery => ({ vendorId: "00000000-0000-4000-8000-000000000001", words: ["acrylic"], alternatives: [], boosts: {}, filters, page: 1, perPage: 20 });

  it("runs a later step only when every earlier one matched nothing, with all bindings in order", () => {
    const steps = [step({ flutes: 2, diameterMm: 3.175 }), step({ diameterMm: 3.175 }), step({})];
    const { sql, bindings } = buildSearchStepsSql(steps);
    expect(sql).toContain("select 0 as step, s0.* from s0\nunion all select 1 as step, s1.* from s1 where (select total from s0) = 0");
    expect(sql).toContain("select 2 as step, s2.* from s2 where (select total from s0) = 0 and (select total from s1) = 0");
    expect(bindings).toEqual(steps.flatMap((s) => buildSearchSql(s).bindings));
    expect(sql.split("?").length - 1).toBe(bindings.length);
  });
});
