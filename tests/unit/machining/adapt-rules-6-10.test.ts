import { describe, expect, it } from "vitest";

import { adaptRecipe } from "@/lib/machining";

import { baseInput, withPatch } from "./fixtures";
import { codes, stepsOf, valueOf } from "./helpers";

describe("rule 6: rigidity", () => {
  it("fires: a machine half as rigid as the reference gets half the depth", () => {
    const r = adaptRecipe(withPatch({ machine: { rigidity: 0.25 } }));
    expect(r.axialDepthMm).toBeCloseTo(1.5, 12);
    expect(stepsOf(r, "rigidity")).toHaveLength(1);
  });

  it("does not fire for a stiffer machine: never above the sheet's ap", () => {
    const r = adaptRecipe(withPatch({ machine: { rigidity: 1 } }));
    expect(r.axialDepthMm).toBe(3);
    expect(stepsOf(r, "rigidity")).toEqual([]);
  });

  it("holds an override deeper than the sheet at the sheet's depth, with a warning", () => {
    const r = adaptRecipe(withPatch({ overrides: { axialDepthMm: 5 } }));
    expect(r.axialDepthMm).toBe(3);
    expect(codes(r)).toContain("axial-depth-override-capped");
  });
});

describe("rule 7: spindle power", () => {
  it("fires: reduces ap until Pc fits 80 % of the rated power", () => {
    // Pc = 0.432 kW > 0.8 × 0.5 = 0.4 kW: ap = 3 × 0.4 / 0.432 = 2.7778 mm
    const r = adaptRecipe(withPatch({ machine: { spindlePowerKw: 0.5 } }));
    expect(r.axialDepthMm).toBeCloseTo(2.77778, 5);
    expect(r.powerKw).toBeCloseTo(0.4, 9);
    expect(codes(r)).not.toContain("machine-too-small");
  });

  it("fires: says the machine is too small below 10 % of the sheet's ap", () => {
    // usable 0.04 kW: ap = 3 × 0.04 / 0.432 = 0.2778 mm < 0.3 mm
    const r = adaptRecipe(withPatch({ machine: { spindlePowerKw: 0.05 } }));
    expect(r.axialDepthMm).toBeCloseTo(0.27778, 5);
    expect(codes(r)).toContain("machine-too-small");
  });

  it("does not fire when the spindle has power to spare", () => {
    const r = adaptRecipe(baseInput());
    expect(stepsOf(r, "spindle-power")).toEqual([]);
    expect(r.powerKw).toBeCloseTo(0.432, 9); // 3 × 6 × 1800 × 800 / 60e6
    expect(r.torqueNm).toBeCloseTo(0.22918, 5); // 9549.3 × 0.432 / 18000
    expect(r.forceN).toBeCloseTo(76.394, 3); // 60000 × 0.432 / 339.292
  });

  it("reports no power without a specific cutting force, and says so", () => {
    const r = adaptRecipe(withPatch({ material: { specificCuttingForceNmm2: undefined } }));
    expect([r.powerKw, r.torqueNm, r.forceN, r.deflectionMm]).toEqual([null, null, null, null]);
    expect(codes(r)).toContain("no-cutting-force-data");
  });
});

describe("rule 8: tool deflection", () => {
  it("fires: warns above 0.025 mm and suggests an ae that meets the limit", () => {
    // base δ at 20 mm = 0.013 mm; at 40 mm it is 8× larger (δ ∝ L³) = 0.104 mm
    const input = withPatch({ overrides: { stickoutMm: 40 } });
    const r = adaptRecipe(input);
    expect(r.deflectionMm).toBeCloseTo(8 * adaptRecipe(baseInput()).deflectionMm!, 9);
    expect(codes(r)).toContain("deflection-above-limit");
    const ae = valueOf(r, "deflection-above-limit", "radialDepthMm")!;
    const again = adaptRecipe({ ...input, overrides: { ...input.overrides, radialDepthMm: ae } });
    expect(again.deflectionMm!).toBeLessThanOrEqual(0.025 * (1 + 1e-6));
    expect(again.deflectionMm!).toBeGreaterThan(0.024);
    // the shorter stick-out meets it too: L = 40 × ∛(0.025 / δ)
    const l = valueOf(r, "deflection-above-limit", "stickoutMm")!;
    expect(adaptRecipe(withPatch({ overrides: { stickoutMm: l } })).deflectionMm).toBeCloseTo(0.025, 9);
  });

  it("does not fire at a short stick-out", () => {
    const r = adaptRecipe(baseInput());
    // F = 76.394 N, L = 20, De = 4.8 mm, I = π × 4.8⁴ / 64 = 26.058 mm⁴:
    // 76.394 × 8000 / (3 × 600000 × 26.058) = 0.013030 mm
    expect(r.deflectionMm).toBeCloseTo(0.01303, 5);
    expect(codes(r)).not.toContain("deflection-above-limit");
  });

  it("says deflection was not checked without a stick-out", () => {
    const r = adaptRecipe(withPatch({ operation: { stickoutMm: undefined } }));
    expect(r.deflectionMm).toBeNull();
    expect(codes(r)).toContain("no-stickout");
  });
});

describe("rule 9: plunge feed", () => {
  it("fires: holds fn when the spindle slows", () => {
    // fn = 600 / 18000 = 0.0333 mm/rev; at 12000 rpm: 400 mm/min
    const r = adaptRecipe(withPatch({ machine: { maxRpm: 12000 } }));
    expect(r.plungeFeedMmMin).toBeCloseTo(400, 9);
    expect(stepsOf(r, "plunge-feed")).toHaveLength(1);
  });

  it("fires: caps the plunge where the thrust estimate exceeds the Z limit", () => {
    // fn max = 20 / (0.5 × 800 × 3) = 0.016667 mm/rev; × 18000 = 300 mm/min
    const r = adaptRecipe(withPatch({ machine: { zThrustN: 20 } }));
    expect(r.plungeFeedMmMin).toBeCloseTo(300, 9);
    expect(codes(r)).toContain("plunge-thrust-limited");
  });

  it("fires: recommends ramp or helical entry for a cutter of 10 mm or more", () => {
    const r = adaptRecipe(withPatch({ operation: { diameterMm: 12, radialDepthMm: 12 } }));
    expect(codes(r)).toContain("ramp-entry-recommended");
  });

  it("does not fire when the spindle speed and thrust allow the sheet's plunge", () => {
    const r = adaptRecipe(baseInput());
    expect(r.plungeFeedMmMin).toBe(600);
    expect(stepsOf(r, "plunge-feed")).toEqual([]);
    expect(codes(r).filter((c) => c.startsWith("plunge") || c.startsWith("ramp"))).toEqual([]);
  });

  it("does not recommend a ramp for an operation that is already a helix", () => {
    expect(codes(adaptRecipe(withPatch({ operation: { kind: "helical", diameterMm: 12, radialDepthMm: 12 } })))).not.toContain("ramp-entry-recommended");
  });
});

describe("rule 10: standard cautions", () => {
  it("fires always, and adds the adapted-values caution when a number changed", () => {
    const r = adaptRecipe(withPatch({ machine: { maxRpm: 12000 } }));
    expect(codes(r)).toEqual(expect.arrayContaining(["standard-cautions", "values-adapted"]));
    expect(codes(r).at(-1)).toBe("standard-cautions");
  });

  it("does not add the adapted-values caution when nothing changed", () => {
    expect(codes(adaptRecipe(baseInput()))).toEqual(["standard-cautions"]);
  });
});
