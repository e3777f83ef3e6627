import { describe, expect, it } from "vitest";

import { adaptRecipe } from "@/lib/machining";

import { baseInput, withPatch } from "./fixtures";
import { codes, stepsOf, valueOf } from "./helpers";

describe("rule 6: chip load band", () => {
  it("fires: hex above the band's ceiling comes down to it (common practice bands)", () => {
    // band 0.2–0.5 % of D = 0.012–0.03 mm on the 6 mm cutter; hex 0.05 → 0.03; vf = 0.03 × 2 × 18000
    const r = adaptRecipe(withPatch({ material: { chipLoadPctOfD: { min: 0.002, max: 0.005 } } }));
    expect(r.maxChipThicknessMm).toBeCloseTo(0.03, 12);
    expect(r.feedMmMin).toBeCloseTo(1080, 9);
    expect(codes(r)).toContain("chip-load-above-maximum");
  });

  it("fires: a cutter whose ceiling is under the floor is told so plainly and never fed past the ceiling", () => {
    // ceiling 0.03 × 6 = 0.18 mm under the 0.2 mm absolute floor
    const r = adaptRecipe(
      withPatch({ operation: { feedMmMin: 9000 }, material: { minChipLoadMm: 0.2, chipLoadPctOfD: { min: 0.012, max: 0.03 } } }),
    );
    expect(codes(r)).toContain("chip-load-band-impossible");
    expect(r.maxChipThicknessMm).toBeLessThanOrEqual(0.18 * (1 + 1e-12));
    expect(r.warnings.find((w) => w.code === "chip-load-band-impossible")?.message).toMatch(/larger cutter or a single-flute/);
  });

  it("does not fire inside the band", () => {
    // band 1.2–3 % of D = 0.072–0.18 mm would put 0.05 under the floor; 0.5–1.5 % = 0.03–0.09 holds it
    const r = adaptRecipe(withPatch({ material: { chipLoadPctOfD: { min: 0.005, max: 0.015 } } }));
    expect(stepsOf(r, "chip-load-band")).toEqual([]);
    expect(codes(r).filter((c) => c.startsWith("chip-load"))).toEqual([]);
  });
});

describe("rule 8: rigidity", () => {
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

  it("holds an override deeper than the sheet at the sheet's depth, with a warning naming the field", () => {
    const r = adaptRecipe(withPatch({ overrides: { axialDepthMm: 5 } }));
    expect(r.axialDepthMm).toBe(3);
    expect(r.warnings.find((w) => w.code === "axial-depth-override-capped")?.field).toBe("overrides.axialDepthMm");
  });
});

describe("rule 9: spindle power at speed", () => {
  it("fires: a constant-torque spindle gives P·n/n_rated, and ap comes down to fit (electric drives, common practice)", () => {
    // P(18000) = 0.5 × 18000/24000 = 0.375 kW; usable 0.3 kW; ap = 3 × 0.3 / 0.432 = 2.0833 mm.
    // Model 1 took the rated 0.5 kW at every speed and kept 2.7778 mm.
    const r = adaptRecipe(withPatch({ machine: { spindlePowerKw: 0.5 } }));
    expect(r.availablePowerKw).toBeCloseTo(0.375, 12);
    expect(r.axialDepthMm).toBeCloseTo(2.083333, 6);
    expect(r.powerKw).toBeCloseTo(0.3, 9);
    expect(codes(r)).toContain("power-limited-at-speed");
    expect(codes(r)).not.toContain("machine-too-small");
  });

  it("fires without the speed derating for a constant-power spindle (Machinery's Handbook power section)", () => {
    // usable 0.8 × 0.5 = 0.4 kW: ap = 3 × 0.4 / 0.432 = 2.7778 mm
    const r = adaptRecipe(withPatch({ machine: { spindlePowerKw: 0.5, spindleKind: "constant-power" } }));
    expect(r.axialDepthMm).toBeCloseTo(2.77778, 5);
    expect(codes(r)).not.toContain("power-limited-at-speed");
  });

  it("fires: says the machine is too small below 10 % of the sheet's ap", () => {
    // usable 0.8 × 0.05 × 0.75 = 0.03 kW: ap = 3 × 0.03 / 0.432 = 0.2083 mm < 0.3 mm
    const r = adaptRecipe(withPatch({ machine: { spindlePowerKw: 0.05 } }));
    expect(r.axialDepthMm).toBeCloseTo(0.208333, 5);
    expect(codes(r)).toContain("machine-too-small");
  });

  it("does not fire when the spindle has power to spare; kc is taken at hm with Kienzle", () => {
    const r = adaptRecipe(baseInput());
    expect(stepsOf(r, "spindle-power")).toEqual([]);
    expect(r.powerKw).toBeCloseTo(0.432, 9); // 3 × 6 × 1800 × 800 / 60e6
    expect(r.torqueNm).toBeCloseTo(0.22918, 5); // 9549.3 × 0.432 / 18000
    expect(r.forceN).toBeCloseTo(76.394, 3); // 60000 × 0.432 / 339.292
    // Kienzle (1952): kc(hm) = 800 × (2·0.05/π)^(−0.25) = 800 / 0.42238 = 1894.0 N/mm²; Pc = 0.432 × 1894.0 / 800
    const k = adaptRecipe(withPatch({ material: { specificCuttingForceNmm2: undefined, kc11Nmm2: 800, mc: 0.25 } }));
    expect(k.powerKw).toBeCloseTo(1.02278, 4);
  });

  it("reports no power without a specific cutting force, and says so", () => {
    const r = adaptRecipe(withPatch({ material: { specificCuttingForceNmm2: undefined } }));
    expect([r.powerKw, r.torqueNm, r.forceN, r.deflectionMm, r.peakForceN, r.plungeThrustN]).toEqual([null, null, null, null, null, null]);
    expect(codes(r)).toContain("no-cutting-force-data");
  });
});

describe("rule 10: tool deflection from the peak tooth force", () => {
  it("does not fire at a short stick-out; δ uses F_peak, not the mean force", () => {
    const r = adaptRecipe(baseInput());
    // Altintas ch. 2: F_peak = kc·ap·hex·ze·√(1 + Kr²) = 800 × 3 × 0.05 × 1 × √1.09 = 125.284 N
    expect(r.peakForceN).toBeCloseTo(125.284, 3);
    expect(r.peakForceN!).toBeGreaterThan(r.forceN!); // model 1 used the 76.4 N mean force
    // Gere & Goodno: δ = F·L³/(3·E·I), I = π × 4.8⁴ / 64 = 26.058 mm⁴: 125.284 × 8000 / (3 × 600000 × 26.058)
    expect(r.deflectionMm).toBeCloseTo(0.021369, 5);
    expect(codes(r)).not.toContain("deflection-above-limit");
  });

  it("fires: warns above 0.025 mm and suggests an ae that meets it, with F_peak recomputed there", () => {
    // four flutes in a slot: ze = 2 teeth in the cut; at L = 22 mm δ = 0.02137 × 1.1³ = 0.02844 mm
    const input = withPatch({ operation: { flutes: 4 }, overrides: { stickoutMm: 22 } });
    const r = adaptRecipe(input);
    expect(r.deflectionMm).toBeCloseTo(0.028443, 5);
    expect(codes(r)).toContain("deflection-above-limit");
    const ae = valueOf(r, "deflection-above-limit", "radialDepthMm")!;
    const again = adaptRecipe({ ...input, overrides: { ...input.overrides, radialDepthMm: ae } });
    expect(again.deflectionMm!).toBeLessThanOrEqual(0.025 * (1 + 1e-6));
    expect(again.deflectionMm!).toBeGreaterThan(0.024);
    // the suggested ap and stick-out meet it too (δ ∝ ap and ∝ L³)
    const ap = valueOf(r, "deflection-above-limit", "axialDepthMm")!;
    expect(adaptRecipe({ ...input, overrides: { ...input.overrides, axialDepthMm: ap } }).deflectionMm).toBeCloseTo(0.025, 9);
    const l = valueOf(r, "deflection-above-limit", "stickoutMm")!;
    expect(adaptRecipe({ ...input, overrides: { stickoutMm: l } }).deflectionMm).toBeCloseTo(0.025, 9);
  });

  it("suggests no ae where one tooth alone bends the cutter too far (two flutes hold hex at any ae)", () => {
    const r = adaptRecipe(withPatch({ overrides: { stickoutMm: 40 } }));
    expect(codes(r)).toContain("deflection-above-limit");
    expect(valueOf(r, "deflection-above-limit", "radialDepthMm")).toBeUndefined();
  });

  it("says deflection was not checked without a stick-out", () => {
    const r = adaptRecipe(withPatch({ operation: { stickoutMm: undefined } }));
    expect(r.deflectionMm).toBeNull();
    expect(codes(r)).toContain("no-stickout");
  });

  it("never takes the stick-out shorter than the flute length", () => {
    const r = adaptRecipe(withPatch({ operation: { fluteLengthMm: 25 } }));
    expect(r.deflectionMm).toBeCloseTo(0.021369 * (25 / 20) ** 3, 5);
  });
});
