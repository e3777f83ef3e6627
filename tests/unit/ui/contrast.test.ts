import { describe, expect, it } from "vitest";

import { contrastRatio, inkFor, luminance } from "@/lib/ui/contrast";

// WCAG 2.1, success criterion 1.4.3 and its definitions of relative luminance and contrast ratio.
describe("contrast", () => {
  it("gives the WCAG extremes: white on black is 21:1, a colour on itself 1:1", () => {
    expect(contrastRatio("#ffffff", "#000000")).toBeCloseTo(21, 5);
    expect(contrastRatio("#2f5d8a", "#2f5d8a")).toBeCloseTo(1, 5);
    expect(luminance("#ffffff")).toBeCloseTo(1, 6);
    expect(luminance("#000000")).toBe(0);
  });

  it("matches the WCAG worked value for mid grey #777777 on white (about 4.48:1, just under AA)", () => {
    // Common practice: #767676 is the lightest grey that passes 4.5:1 on white; #777777 just fails.
    expect(contrastRatio("#777777", "#ffffff")).toBeLessThan(4.5);
    expect(contrastRatio("#767676", "#ffffff")).toBeGreaterThanOrEqual(4.5);
  });

  it("picks dark ink on a light accent and white ink on a dark accent", () => {
    expect(inkFor("#f5d90a")).toBe("#000000");
    expect(inkFor("#1f5f5b")).toBe("#ffffff");
    // WCAG AA for normal text is 4.5:1; with pure black or white ink every accent reaches it.
    for (const accent of ["#1f5f5b", "#8a3b12", "#f5d90a", "#00a3ff", "#777777", "#7a7a7a", "#808080"]) {
      expect(contrastRatio(accent, inkFor(accent))).toBeGreaterThanOrEqual(4.5);
    }
  });
});
