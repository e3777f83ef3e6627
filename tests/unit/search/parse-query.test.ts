import { describe, expect, it } from "vitest";

import { parseQuery } from "@/search/parse";

describe("parseQuery whole queries", () => {
  it.each(["1/8 acrylic slot", "3.175 mm PMMA", "0.125 plexi"])(
    "reads %s as a 3.175 mm cutter in acrylic (1/8 in × 25.4 = 3.175 mm)",
    (input) => {
      const q = parseQuery(input);
      expect(q.diameterMm).toBe(3.175);
      expect(q.materials).toEqual(["acrylic"]);
      expect(q.text).toBe("");
    },
  );

  it("reads 1/8 2F acrylic slot", () => {
    expect(parseQuery("1/8 2F acrylic slot")).toMatchObject({
      diameterMm: 3.175,
      flutes: 2,
      materials: ["acrylic"],
      operations: ["slotting"],
      text: "",
    });
  });

  it("reads 6mm 3 flute aluminum pocket", () => {
    expect(parseQuery("6mm 3 flute aluminum pocket")).toMatchObject({
      diameterMm: 6,
      flutes: 3,
      materials: ["aluminium"],
      operations: ["pocket"],
      text: "",
    });
  });

  it("reads 1 1/4 compression plywood profile (1.25 × 25.4 = 31.75 mm)", () => {
    expect(parseQuery("1 1/4 compression plywood profile")).toMatchObject({
      diameterMm: 31.75,
      geometry: ["compression"],
      materials: ["plywood"],
      operations: ["profile"],
      text: "",
    });
  });

  it("reads ball nose 6mm finishing mdf", () => {
    expect(parseQuery("ball nose 6mm finishing mdf")).toMatchObject({
      diameterMm: 6,
      cornerForms: ["ball"],
      operations: ["finishing"],
      materials: ["mdf"],
      text: "",
    });
  });

  it("gives one chip per recognised part, in query order", () => {
    expect(parseQuery("1/8 2F acrylic slot").chips.map((c) => [c.kind, c.label])).toEqual([
      ["diameter", 'Ø 3.175\u00a0mm (1/8")'],
      ["flutes", "2 flutes"],
      ["material", "acrylic"],
      ["operation", "slotting"],
    ]);
  });

  it("keeps an SKU both as an SKU and in the free text", () => {
    const q = parseQuery("SB-1F-3175 acrylic");
    expect(q.skus).toEqual(["SB-1F-3175"]);
    expect(q.text).toBe("sb-1f-3175");
    expect(q.materials).toEqual(["acrylic"]);
    expect(parseQuery("kt2-0635").skus).toEqual(["KT2-0635"]);
  });

  it("does not take trade words with hyphens for SKUs", () => {
    for (const input of ["2-flute", "up-cut", "6061-T6", "ball-nose", "o-flute", "1-1/4"]) {
      expect(parseQuery(input).skus, input).toEqual([]);
    }
  });

  it("folds repeated synonyms into one value and one chip", () => {
    const q = parseQuery("acrylic PMMA plexi");
    expect(q.materials).toEqual(["acrylic"]);
    expect(q.chips).toHaveLength(1);
  });

  it("keeps unknown words as lower-case free text without stop words", () => {
    expect(parseQuery("Sign LETTERS in acrylic").text).toBe("sign letters");
  });

  it("gives empty lists for an empty query", () => {
    expect(parseQuery("")).toEqual({
      query: "",
      text: "",
      operations: [],
      materials: [],
      materialGroups: [],
      cornerForms: [],
      geometry: [],
      skus: [],
      chips: [],
      truncated: false,
    });
  });
});
