import { describe, expect, it } from "vitest";

import { parseQuery } from "@/search/parse/parse-query";
import { correctTypos, correctWord } from "@/search/run/correct-typos";
import { editDistance } from "@/search/run/edit-distance";
import { highlighter, highlightRanges } from "@/search/run/highlight";
import { planSearch } from "@/search/run/plan-search";

describe("edit distance", () => {
  it("counts insertions, deletions, substitutions and adjacent swaps", () => {
    expect(editDistance("alumnium", "aluminium", 2)).toBe(1); // one letter missing
    expect(editDistance("acrilic", "acrylic", 2)).toBe(1); // i for y
    expect(editDistance("arcylic", "acrylic", 2)).toBe(1); // rc swapped
    expect(editDistance("kitten", "sitting", 5)).toBe(3);
    expect(editDistance("abc", "xyzxyz", 1)).toBe(2); // past the budget: budget + 1
  });
});

describe("typo correction", () => {
  it("reads a near vocabulary word as that word, within the typo budget of the settings", () => {
    expect(correctWord("alumnium")).toBe("aluminium");
    expect(correctWord("plywod")).toBe("plywood");
    expect(correctWord("acryl")).toBeUndefined(); // two edits from "acrylic" at five letters: budget is one
    expect(correctWord("mdff")).toBeUndefined(); // under five letters: exact only
    expect(correctWord("acrylic")).toBeUndefined();
  });

  it("parses the corrected query again, so the typo becomes a filter", () => {
    const { parsed, corrections } = correctTypos(parseQuery("1/8 alumnium slot"));
    expect(corrections).toEqual([{ from: "alumnium", to: "aluminium" }]);
    expect(parsed.materials).toEqual(["aluminium"]);
    expect(parsed.diameterMm).toBe(3.175);
  });
});

describe("highlight ranges", () => {
  it("finds terms at word starts, ignoring case and accents, and merges overlaps", () => {
    expect(highlightRanges("Cast acrylic, 1/8 in", ["acrylic", "ACRY", "1/8"])).toEqual([
      [5, 12],
      [14, 17],
    ]);
    expect(highlightRanges("Acrylique coulé", ["coule"])).toEqual([[10, 15]]);
    expect(highlightRanges("polyacrylic", ["acrylic"])).toEqual([]);
  });

  it("folds accented and upper-case text and terms alike, with offsets into the original text", () => {
    expect(highlighter(["Coulé", "acrylique"])("ACRYLIQUE COULÉ")).toEqual([
      [0, 9],
      [10, 15],
    ]);
    expect(highlighter(["cafe"])("Café Ångström cafe")).toEqual([
      [0, 4],
      [14, 18],
    ]);
  });

  it("matches terms with punctuation and regular-expression characters as plain text", () => {
    expect(highlighter(["b3-up2-6", '0.25"', "(pmma)", "1/8"])('B3-UP2-6-12 cuts 0.25" (PMMA), 1/8 in, b3xup2x6')).toEqual([
      [0, 8],
      [17, 22],
      [23, 29],
      [31, 34],
    ]);
    expect(highlighter([".*"])("anything at all")).toEqual([]);
  });

  it("extends a range with a term that starts inside it at a later word start", () => {
    expect(highlighter(["cast acr", "acrylic sheet"])("Cast acrylic sheet")).toEqual([[0, 18]]);
  });

  it("returns only offsets, never markup, so `<script>` in a title stays text", () => {
    expect(highlightRanges("<script>alert(1)</script> acrylic", ["acrylic"])).toEqual([[26, 33]]);
  });
});

describe("search plan", () => {
  it("filters on every parsed part first, then relaxes flutes before the diameter and the material last", () => {
    const plan = planSearch(parseQuery("1/8 2F acrylic slot"));
    expect(plan.steps[0].filters).toMatchObject({ diameterMm: 3.175, flutes: 2, operations: ["slotting"] });
    expect(plan.steps[0].filters.materialKeys).toEqual(expect.arrayContaining(["acrylic", "acrylic-cast", "acrylic-extruded"]));
    const firstWithoutFlutes = plan.steps.find((s) => s.filters.flutes === undefined)!;
    expect(firstWithoutFlutes.filters.diameterMm).toBe(3.175);
    expect(plan.boosts).toMatchObject({ diameterMm: 3.175, flutes: 2 });
  });

  it("widens a narrow material to its wider material before giving it up", () => {
    const plan = planSearch(parseQuery("extruded pmma"));
    expect(plan.steps.map((s) => s.filters.materialKeys ?? s.filters.materialGroups)).toEqual([
      ["acrylic-extruded"],
      ["acrylic", "acrylic-cast", "acrylic-extruded"],
      ["plastics"],
    ]);
  });

  it("drops one kind before two, so “1/8 mdf ball” keeps the ball nose when only the diameter fails", () => {
    const steps = planSearch(parseQuery("1/8 mdf ball")).steps.map((s) => s.dropped.join("+"));
    expect(steps.indexOf("diameter")).toBeGreaterThan(-1);
    expect(steps.indexOf("diameter")).toBeLessThan(steps.indexOf("cornerForm+diameter"));
  });

  it("keeps facet selections as filters in every step", () => {
    const plan = planSearch(parseQuery("2F jig"), { operation: "profile", diameterMm: 6 });
    expect(plan.steps.every((s) => s.filters.diameterMm === 6 && s.filters.operations?.includes("profile"))).toBe(true);
  });

  it("never drops every filter when no words are left to match", () => {
    const plan = planSearch(parseQuery("1/8 2F"));
    expect(plan.steps.every((s) => Object.keys(s.filters).length > 0)).toBe(true);
  });
});
