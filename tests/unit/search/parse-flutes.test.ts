import { describe, expect, it } from "vitest";

import { parseQuery } from "@/search/parse";

describe("parseQuery flute counts", () => {
  it.each([
    ["2 flute", 2],
    ["2 flutes", 2],
    ["2-flute", 2],
    ["2flute", 2],
    ["2F", 2],
    ["2fl", 2],
    ["3 fl", 3],
    ["three flutes", 3],
    ["4-fluted", 4],
    ["z2", 2],
    ["1 flute", 1],
  ])("reads %s", (input, flutes) => {
    const q = parseQuery(input);
    expect(q.flutes).toBe(flutes);
    expect(q.text).toBe("");
    expect(q.chips).toEqual([
      { kind: "flutes", label: flutes === 1 ? "1 flute" : `${flutes} flutes`, value: String(flutes), sourceText: input },
    ]);
  });

  it.each([
    ["single flute", "single-flute"],
    ["single-flute", "single-flute"],
    ["one flute", "single-flute"],
    ["o-flute", "o-flute"],
    ["O flute", "o-flute"],
  ])("reads %s as one flute plus its geometry", (input, geometry) => {
    const q = parseQuery(input);
    expect(q.flutes).toBe(1);
    expect(q.geometry).toEqual([geometry]);
  });

  it("does not read 0 or 40 flutes", () => {
    expect(parseQuery("0 flute").flutes).toBeUndefined();
    expect(parseQuery("40F").flutes).toBeUndefined();
  });
});
