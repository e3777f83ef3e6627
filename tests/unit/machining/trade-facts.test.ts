import { describe, expect, it } from "vitest";

import { adaptRecipe, cuttingSpeed, inToMm, mmMinToInMin, mpmToSfm, plungeFeed, plungeThrustN, sfmToMpm, spindleSpeed } from "@/lib/machining";

import { baseInput } from "./fixtures";

// Facts of the trade from DOMAIN.md: common practice, no single source.
describe("facts of the trade (common practice)", () => {
  it("a 1/4 in cutter at 10 000 rpm runs at about 654 SFM, about 199.5 m/min", () => {
    const vc = cuttingSpeed({ diameterMm: inToMm(0.25), rpm: 10000 });
    expect(vc).toBeCloseTo(199.5, 1);
    expect(mpmToSfm(vc)).toBeCloseTo(654.5, 1);
  });

  it("cast acrylic at about 600 SFM with a 1/4 in carbide cutter is about 9 200 rpm", () => {
    // 12 × 600 / (π × 0.25) = 9167 rpm
    expect(spindleSpeed({ diameterMm: 6.35, cuttingSpeedMpm: sfmToMpm(600) })).toBeCloseTo(9167, 0);
  });

  it("a plunge at 0.001 in per revolution at 10 000 rpm is a 10 in/min plunge feed", () => {
    expect(mmMinToInMin(plungeFeed({ feedPerRevMm: inToMm(0.001), rpm: 10000 }))).toBeCloseTo(10, 10);
  });

  it("a larger cutter needs more axial force to plunge at the same feed per revolution", () => {
    const at = (diameterMm: number) => plungeThrustN({ kcNmm2: 800, feedPerRevMm: 0.03, diameterMm });
    expect(at(12)).toBeGreaterThan(at(6));
  });

  it("full-width slotting runs slower than pocketing at part width", () => {
    const pocket = { ...baseInput(), operation: { ...baseInput().operation, kind: "pocket" as const, radialDepthMm: 2.4 } };
    const asPocket = adaptRecipe(pocket);
    const asSlot = adaptRecipe({ ...pocket, overrides: { radialDepthMm: 6 } });
    expect(asSlot.feedMmMin).toBeLessThan(asPocket.feedMmMin);
  });

  it("below the minimum chip load the engine warns that the cutter rubs", () => {
    const input = baseInput();
    const result = adaptRecipe({ ...input, material: { ...input.material, minChipLoadMm: 0.08 } });
    expect(result.warnings.map((w) => w.code)).toContain("chip-load-below-minimum");
  });

  it("a large cutter is steered to a ramp or helical entry", () => {
    const input = baseInput();
    const big = adaptRecipe({ ...input, operation: { ...input.operation, diameterMm: 16, radialDepthMm: 16 } });
    expect(big.warnings.map((w) => w.code)).toContain("ramp-entry-recommended");
  });
});
