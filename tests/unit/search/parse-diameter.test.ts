import { describe, expect, it } from "vitest";

import { parseQuery } from "@/search/parse";

// Check values: 1 in = 25.4 mm exactly (NIST SP 811), so 1/8 in = 3.175 mm, 1/4 in = 6.35 mm,
// 1 1/4 in = 31.75 mm, 1/16 in = 1.5875 mm.
describe("parseQuery diameters", () => {
  it.each([
    ["1/8", 3.175],
    ['1/8"', 3.175],
    ["1/8 in", 3.175],
    ["1/8in", 3.175],
    ["1/8-in", 3.175],
    ["1/8 inch", 3.175],
    ["1 1/4", 31.75],
    ['1 1/4"', 31.75],
    ["1-1/4 in", 31.75],
    ["1¼", 31.75],
    ["⅛", 3.175],
    ["0.125", 3.175],
    [".25", 6.35],
    ['0.25"', 6.35],
    ["0.125 in", 3.175],
    ["1/8″", 3.175],
    ["1/8''", 3.175],
  ])("reads the inch form %s", (input, mm) => {
    expect(parseQuery(input).diameterMm).toBe(mm);
    expect(parseQuery(input).text).toBe("");
  });

  it.each([
    ["3.175 mm", 3.175],
    ["3.175mm", 3.175],
    ["6mm", 6],
    ["6 mm", 6],
    ["6 millimetres", 6],
    ["Ø6", 6],
    ["ø 6", 6],
    ["⌀6", 6],
    ["d6", 6],
    ["D6mm", 6],
    ["dia 8", 8],
    ["6.35", 6.35],
  ])("reads the mm form %s", (input, mm) => {
    expect(parseQuery(input).diameterMm).toBe(mm);
  });

  it("snaps a decimal inch within 0.0005 in of a 1/64 size to that size (.063 → 1/16)", () => {
    const q = parseQuery(".063");
    expect(q.diameterMm).toBe(1.5875);
    expect(q.diameterText).toBe('1/16"');
  });

  it("reads a bare decimal that is no fractional-inch size as mm (0.8 is 0.8 mm, not 0.8 in)", () => {
    expect(parseQuery("0.8").diameterMm).toBe(0.8);
  });

  it("keeps an explicit inch decimal that is no fraction as it is", () => {
    // 0.13 in × 25.4 = 3.302 mm; 0.13 is 0.005 in from 1/8, outside the tolerance
    expect(parseQuery('0.13"').diameterMm).toBe(3.302);
  });

  it("does not read bare whole numbers, alloy numbers or huge sizes as diameters", () => {
    for (const input of ["6", "6061", "2", "6 in", "500mm", "0 mm", "1/0"]) {
      expect(parseQuery(input).diameterMm, input).toBeUndefined();
    }
  });

  it("shows the diameter in mm and in the unit the user wrote", () => {
    const inch = parseQuery("1/8").chips[0];
    expect(inch).toMatchObject({ kind: "diameter", value: "3.175", sourceText: "1/8" });
    expect(inch.label).toBe('Ø 3.175\u00a0mm (1/8")');
    expect(parseQuery("1/8").diameterText).toBe('1/8"');
    expect(parseQuery("6mm").chips[0].label).toBe("Ø 6\u00a0mm");
    expect(parseQuery("6mm").diameterText).toBe("6\u00a0mm");
  });

  it("takes the first diameter and leaves a second one as text", () => {
    const q = parseQuery("1/8 1/4");
    expect(q.diameterMm).toBe(3.175);
    expect(q.text).toBe("1/4");
  });
});
