import { describe, expect, it } from "vitest";

import { adaptRecipe, MachiningInputError } from "@/lib/machining";

import { baseInput, withPatch } from "./fixtures";
import { codes, stepsOf, valueOf } from "./helpers";

describe("the unchanged base case", () => {
  it("changes nothing and carries only the standard cautions", () => {
    const r = adaptRecipe(baseInput());
    expect(r.steps).toEqual([]);
    expect(codes(r)).toEqual(["standard-cautions"]);
    expect([r.rpm, r.feedMmMin, r.axialDepthMm, r.radialDepthMm, r.plungeFeedMmMin]).toEqual([18000, 1800, 3, 6, 600]);
    expect(r.chipLoadMm).toBeCloseTo(0.05, 12); // 1800 / (2 × 18000)
  });
});

describe("rule 1: reference chip load and hex", () => {
  it("fires when the sheet's ae is under half the diameter", () => {
    // ae = D/4: hex = 0.05 × sin 60° = 0.0433 mm
    const r = adaptRecipe(withPatch({ operation: { radialDepthMm: 1.5 } }));
    const [step] = stepsOf(r, "reference-chip-load");
    expect(step.before).toBeCloseTo(0.05, 12);
    expect(step.after).toBeCloseTo(0.0433013, 7);
    expect(r.maxChipThicknessMm).toBeCloseTo(0.0433013, 7);
  });

  it("does not fire for a full slot, where hex = fz", () => {
    const r = adaptRecipe(baseInput());
    expect(stepsOf(r, "reference-chip-load")).toEqual([]);
    expect(r.maxChipThicknessMm).toBeCloseTo(r.chipLoadMm, 12);
  });
});

describe("rule 2: engagement: a radial override holds hex", () => {
  it("fires: a slot sheet cut at ae = 10 % of D raises fz by CTF = 1/0.6", () => {
    // hex = 0.05 (slot); fz = 0.05 / 0.6 = 0.08333; vf = 0.08333 × 2 × 18000 = 3000 mm/min
    const r = adaptRecipe(withPatch({ overrides: { radialDepthMm: 0.6 } }));
    expect(stepsOf(r, "radial-chip-thinning")).toHaveLength(1);
    expect(r.chipLoadMm).toBeCloseTo(0.083333, 6);
    expect(r.feedMmMin).toBeCloseTo(3000, 6);
    expect(r.maxChipThicknessMm).toBeCloseTo(0.05, 12);
  });

  it("does not fire for an override at or above half the diameter (CTF stays 1)", () => {
    const r = adaptRecipe(withPatch({ overrides: { radialDepthMm: 4 } }));
    expect(stepsOf(r, "radial-chip-thinning")).toEqual([]);
    expect(r.radialDepthMm).toBe(4);
    expect(r.chipLoadMm).toBeCloseTo(0.05, 12);
  });

  it("refuses an override under 5 % of D with a clear message", () => {
    const run = () => adaptRecipe(withPatch({ overrides: { radialDepthMm: 0.2 } }));
    expect(run).toThrowError(MachiningInputError);
    expect(run).toThrowError(/under 5 %.*at least 0\.3\smm/);
    expect(run).toThrowError(expect.objectContaining({ field: "overrides.radialDepthMm" }));
  });
});

describe("rule 4: spindle speed range", () => {
  it("fires: clamps to the machine's max rpm and holds the chip load", () => {
    const r = adaptRecipe(withPatch({ machine: { maxRpm: 12000 } }));
    expect(stepsOf(r, "spindle-speed-range")).toHaveLength(1);
    expect(r.rpm).toBe(12000);
    expect(r.feedMmMin).toBeCloseTo(1200, 9); // 0.05 × 2 × 12000
  });

  it("fires: raises to the machine's min rpm", () => {
    const r = adaptRecipe(withPatch({ machine: { minRpm: 20000 } }));
    expect(r.rpm).toBe(20000);
  });

  it("does not fire inside the range", () => {
    expect(stepsOf(adaptRecipe(baseInput()), "spindle-speed-range")).toEqual([]);
  });
});

describe("rule 5: feed limit and the chip load floor", () => {
  it("fires: caps the feed at the machine's max and lowers fz", () => {
    // 1000 / (2 × 18000) = 0.02778 mm, still above the 0.02 mm minimum: rpm stays
    const r = adaptRecipe(withPatch({ machine: { maxFeedMmMin: 1000 } }));
    expect(r.feedMmMin).toBe(1000);
    expect(r.rpm).toBe(18000);
    expect(r.chipLoadMm).toBeCloseTo(0.027778, 6);
    expect(codes(r)).toContain("feed-capped");
    expect(codes(r)).not.toContain("chip-load-below-minimum");
  });

  it("fires: lowers n to restore fz when the capped chip load would rub", () => {
    // capped fz = 500/36000 = 0.0139 < 0.02; n = 500 / (2 × 0.05) = 5000 rpm restores fz = 0.05
    const r = adaptRecipe(withPatch({ machine: { maxFeedMmMin: 500, minRpm: 3000 } }));
    expect(r.rpm).toBeCloseTo(5000, 9);
    expect(r.chipLoadMm).toBeCloseTo(0.05, 12);
    expect(stepsOf(r, "feed-limit").map((s) => s.field)).toContain("rpm");
  });

  it("fires: stops at n_min and warns when fz is still below the minimum", () => {
    // n = max(6000, 200/0.1 = 2000) = 6000; fz = 200 / 12000 = 0.01667 < 0.02
    const r = adaptRecipe(withPatch({ machine: { maxFeedMmMin: 200 } }));
    expect(r.rpm).toBe(6000);
    expect(r.chipLoadMm).toBeCloseTo(0.016667, 6);
    expect(codes(r)).toContain("chip-load-below-minimum");
  });

  it("does not fire below the machine's max feed", () => {
    const r = adaptRecipe(baseInput());
    expect(stepsOf(r, "feed-limit")).toEqual([]);
    expect(codes(r)).not.toContain("feed-capped");
  });
});

describe("rule 7: cutting speed window", () => {
  it("fires below the window", () => {
    // vc = π × 6 × 18000 / 1000 = 339.3 m/min < 400
    const r = adaptRecipe(withPatch({ material: { cuttingSpeedWindowMpm: [400, 600] } }));
    expect(r.cuttingSpeedMpm).toBeCloseTo(339.292, 3);
    expect(codes(r)).toContain("cutting-speed-below-window");
  });

  it("fires above the window", () => {
    expect(codes(adaptRecipe(withPatch({ material: { cuttingSpeedWindowMpm: [100, 300] } })))).toContain("cutting-speed-above-window");
  });

  it("does not fire inside the window or without one", () => {
    expect(codes(adaptRecipe(baseInput())).filter((c) => c.startsWith("cutting-speed"))).toEqual([]);
    expect(codes(adaptRecipe(withPatch({ material: { cuttingSpeedWindowMpm: undefined } })))).not.toContain("cutting-speed-below-window");
  });
});

describe("rule 1: mean chip thickness and the ball nose", () => {
  it("reports hm = 2·fz/π for a slot (Altintas ch. 2)", () => {
    expect(adaptRecipe(baseInput()).meanChipThicknessMm).toBeCloseTo((2 * 0.05) / Math.PI, 12);
  });

  it("fires for a shallow ball nose: hex = fz·De/D (Machinery's Handbook)", () => {
    // De = 2·√(0.2·5.8) = 2.15407 mm; hex = 0.05 × 2.15407 / 6 = 0.017951 mm
    const r = adaptRecipe(withPatch({ operation: { cornerForm: "ball", axialDepthMm: 0.2 } }));
    expect(r.effectiveDiameterMm).toBeCloseTo(2.154066, 5);
    expect(stepsOf(r, "reference-chip-load")[0].after).toBeCloseTo(0.017951, 5);
  });

  it("treats a corner radius of D/2 as a ball nose, a smaller one as a corner-radius cutter", () => {
    expect(adaptRecipe(withPatch({ operation: { cornerRadiusMm: 3, axialDepthMm: 0.2 } })).effectiveDiameterMm).toBeCloseTo(2.154066, 5);
    expect(adaptRecipe(withPatch({ operation: { cornerRadiusMm: 1, axialDepthMm: 0.2 } })).effectiveDiameterMm).toBe(6);
  });
});

describe("rule 2: engagement: slotting factor and depth override", () => {
  const pocket = { operation: { kind: "pocket" as const, radialDepthMm: 3 } };

  it("fires: going to full width from a pocket multiplies fz by 0.75 and caps ap at 0.7× (common practice)", () => {
    const r = adaptRecipe(withPatch({ ...pocket, overrides: { radialDepthMm: 6 } }));
    expect(r.chipLoadMm).toBeCloseTo(0.0375, 12); // 0.05 × 0.75
    expect(r.feedMmMin).toBeCloseTo(1350, 9); // 75 % of 1800
    expect(r.axialDepthMm).toBeCloseTo(2.1, 12); // 0.7 × 3
    expect(codes(r)).toContain("slotting-factor-applied");
  });

  it("does not fire for a sheet that is already a slot, or short of 90 % of D", () => {
    expect(codes(adaptRecipe(withPatch({ overrides: { radialDepthMm: 6 } })))).not.toContain("slotting-factor-applied");
    const r = adaptRecipe(withPatch({ ...pocket, overrides: { radialDepthMm: 5.3 } }));
    expect(codes(r)).not.toContain("slotting-factor-applied");
    expect(r.chipLoadMm).toBeCloseTo(0.05, 12);
  });

  it("records an axial depth override as a step", () => {
    const r = adaptRecipe(withPatch({ overrides: { axialDepthMm: 2 } }));
    expect(r.axialDepthMm).toBe(2);
    expect(stepsOf(r, "radial-chip-thinning").map((s) => s.field)).toEqual(["axialDepthMm"]);
  });
});

describe("rule 3: entry capability", () => {
  const melting = { material: { meltsWhenRubbing: true } };

  it("fires: straight plunges only in a material that melts keeps ap ≤ D/4 (common practice)", () => {
    const r = adaptRecipe({ ...withPatch(melting), entryCapability: "plunge-only" });
    expect(r.axialDepthMm).toBe(1.5);
    expect(stepsOf(r, "entry-capability")).toHaveLength(1);
    expect(codes(r)).toContain("plunge-only-shallow-passes");
  });

  it("does not fire with a ramp or helix, or in a material that does not melt", () => {
    expect(adaptRecipe({ ...withPatch(melting), entryCapability: "ramp" }).axialDepthMm).toBe(3);
    expect(adaptRecipe({ ...withPatch(melting), entryCapability: "helix" }).axialDepthMm).toBe(3);
    expect(adaptRecipe({ ...baseInput(), entryCapability: "plunge-only" }).axialDepthMm).toBe(3);
  });
});

describe("rule 4: a shallow ball nose is sped up toward the window", () => {
  it("fires: vc at De = 2.154 mm is under 200 m/min, so n rises to the machine's top speed", () => {
    // wanted n = 1000 × 200 / (π × 2.15407) = 29 554 rpm, capped at 24 000
    const r = adaptRecipe(
      withPatch({ operation: { cornerForm: "ball", axialDepthMm: 0.2 }, material: { cuttingSpeedWindowMpm: [200, 500] } }),
    );
    expect(r.rpm).toBe(24000);
    expect(stepsOf(r, "spindle-speed-range")).toHaveLength(1);
    expect(r.cuttingSpeedMpm).toBeCloseTo((Math.PI * 2.154066 * 24000) / 1000, 2); // 162.4 m/min, judged at De
    expect(codes(r)).toContain("cutting-speed-below-window");
  });

  it("does not fire when vc at De is inside the window", () => {
    // vc = π × 2.15407 × 18000 / 1000 = 121.8 m/min ≥ 100
    const r = adaptRecipe(withPatch({ operation: { cornerForm: "ball", axialDepthMm: 0.2 } }));
    expect(r.rpm).toBe(18000);
    expect(r.cuttingSpeedMpm).toBeCloseTo(121.8, 1);
  });
});

describe("rule 5: the floor is compared with hex, not fz", () => {
  it("fires: fz = 0.05 mm at ae = 10 % of D has hex = 0.03 mm, under a 0.045 mm floor", () => {
    const r = adaptRecipe(withPatch({ operation: { radialDepthMm: 0.6 }, material: { minChipLoadMm: 0.045 } }));
    expect(r.maxChipThicknessMm).toBeCloseTo(0.03, 12);
    expect(codes(r)).toContain("chip-load-below-minimum");
    // the feed that restores hex = 0.045: fz = 0.045 / 0.6 = 0.075; × 2 × 18000 = 2700 mm/min
    expect(valueOf(r, "chip-load-below-minimum", "feedMmMin")).toBeCloseTo(2700, 9);
  });

  it("does not fire when hex is above the floor", () => {
    expect(codes(adaptRecipe(withPatch({ operation: { radialDepthMm: 0.6 }, material: { minChipLoadMm: 0.02 } })))).not.toContain(
      "chip-load-below-minimum",
    );
  });
});
