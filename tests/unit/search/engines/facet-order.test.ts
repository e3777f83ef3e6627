import { describe, expect, it } from "vitest";

import { compareFacetValues } from "@/search/engines/facet-order";

describe("facet value order", () => {
  it("sorts numbers by value and words alphabetically, ignoring case", () => {
    expect(["12", "3", "6.35", "3.175"].sort(compareFacetValues)).toEqual(["3", "3.175", "6.35", "12"]);
    expect(["wood", "Composites", "plastics"].sort(compareFacetValues)).toEqual(["Composites", "plastics", "wood"]);
  });
});
