import { describe, expect, it } from "vitest";

import { searchSettings } from "@/search/settings";
import { synonymGroups } from "@/search/vocabulary";

describe("search settings", () => {
  it("ranks the title first and the body text last", () => {
    expect(searchSettings.searchableAttributes[0]).toBe("title");
    expect(searchSettings.searchableAttributes.at(-1)).toBe("body");
  });

  it("can filter on everything the parser reads, and on the vendor", () => {
    for (const field of [
      "vendorId",
      "diameterMm",
      "flutes",
      "materialKey",
      "materialGroup",
      "operations",
      "cornerForm",
      "cutterSku",
    ] as const) {
      expect(searchSettings.filterableAttributes).toContain(field);
    }
  });

  it("offers facets and sorts only on filterable or stored fields, never on the vendor", () => {
    for (const facet of searchSettings.facets) expect(searchSettings.filterableAttributes).toContain(facet);
    expect(searchSettings.facets).not.toContain("vendorId");
    expect(searchSettings.sortableAttributes).toEqual(["publishedAt", "diameterMm", "title"]);
  });

  it("takes its synonyms from the vocabulary", () => {
    expect(searchSettings.synonyms).toBe(synonymGroups);
  });

  it("lets the typo from the issue (alumnium, 8 letters) through with one typo", () => {
    const { minWordSizeForOneTypo, minWordSizeForTwoTypos } = searchSettings.typoTolerance;
    expect("alumnium".length).toBeGreaterThanOrEqual(minWordSizeForOneTypo);
    expect(minWordSizeForTwoTypos).toBeGreaterThan(minWordSizeForOneTypo);
  });
});
