import { describe, expect, it } from "vitest";

import { adaptRecipe } from "@/lib/machining";

import { baseInput, withPatch } from "./fixtures";
import { codes, fieldOf, stepsOf } from "./helpers";

describe("rule 11: plunge feed and Z thrust", () => {
  it("fires: holds fn when the spindle slows", () => {
    // fn = 600 / 18000 = 0.0333 mm/rev; at 12000 rpm: 400 mm/min
    const r = adaptRecipe(withPatch({ machine: { maxRpm: 12000 } }));
    expect(r.plungeFeedMmMin).toBeCloseTo(400, 9);
    expect(r.plungeFeedPerRevMm).toBeCloseTo(1 / 30, 12);
    expect(stepsOf(r, "plunge-feed")).toHaveLength(1);
  });

  it("fires: caps fn where the thrust exceeds the Z axis, and recommends a ramp or helix", () => {
    // centre 0.012 × 800 × 36 = 345.6 N; fn = ((400 − 345.6) / (2.1 × 800 × 6))^(1/0.8) = 0.0014628 mm/rev
    const r = adaptRecipe(withPatch({ machine: { zThrustN: 400 } }));
    expect(r.plungeFeedPerRevMm).toBeCloseTo(0.0014628, 6);
    expect(r.plungeFeedMmMin).toBeCloseTo(0.0014628 * 18000, 2);
    expect(r.plungeThrustN).toBeCloseTo(400, 6);
    expect(codes(r)).toEqual(expect.arrayContaining(["plunge-thrust-limited", "ramp-entry-recommended"]));
  });

  it("fires: refuses a straight plunge where the centre term alone exceeds the Z thrust", () => {
    const r = adaptRecipe(withPatch({ machine: { zThrustN: 300 } }));
    expect(r.plungeFeedMmMin).toBeNull();
    expect(r.plungeThrustN).toBeCloseTo(345.6, 9);
    const w = r.warnings.find((x) => x.code === "straight-plunge-refused");
    expect(w?.field).toBe("machine.zThrustN");
    expect(w?.message).toMatch(/ramp or helical entry is required/);
    expect(codes(r)).toContain("ramp-entry-recommended");
  });

  it("uses the rigidity class's Z thrust when the machine gives none, and says it was assumed", () => {
    // rigidity 0.5 is the medium class: 400 N, the same cap as above
    const input = baseInput();
    const r = adaptRecipe({ ...input, machine: { ...input.machine, zThrustN: undefined } });
    expect(r.plungeFeedPerRevMm).toBeCloseTo(0.0014628, 6);
    expect(r.warnings.find((w) => w.code === "plunge-thrust-limited")?.message).toMatch(/assumed for a medium machine/);
  });

  it("states the thrust in the caller's units", () => {
    const r = adaptRecipe(withPatch({ machine: { zThrustN: 400 }, options: { messageUnits: "imperial" } }));
    // 0.0014628 × 18000 = 26.3 mm/min = 1.04 in/min; 400 N = 89.9 lbf
    expect(r.warnings.find((w) => w.code === "plunge-thrust-limited")?.message).toMatch(/1\.04\sin\/min.*89\.9\slbf/);
  });

  it("fires: recommends ramp or helical entry for a cutter of 10 mm or more", () => {
    const r = adaptRecipe(withPatch({ operation: { diameterMm: 12, radialDepthMm: 12 } }));
    expect(codes(r)).toContain("ramp-entry-recommended");
  });

  it("does not fire when the spindle speed and thrust allow the sheet's plunge", () => {
    const r = adaptRecipe(baseInput());
    expect(r.plungeFeedMmMin).toBe(600);
    expect(r.plungeThrustN).toBeCloseTo(1009.0, 0);
    expect(stepsOf(r, "plunge-feed")).toEqual([]);
    expect(codes(r).filter((c) => c.startsWith("plunge") || c.startsWith("ramp") || c.startsWith("straight"))).toEqual([]);
  });

  it("does not recommend a ramp for an operation that is already a helix", () => {
    expect(
      codes(adaptRecipe(withPatch({ operation: { kind: "helical", diameterMm: 12, radialDepthMm: 12, plungeFeedMmMin: undefined } }))),
    ).not.toContain("ramp-entry-recommended");
  });
});

describe("rule 12: sanity limits", () => {
  it("fires: refuses ap above the flute length, stick-out above 20·D and cutters outside 0.1–100 mm, naming the field", () => {
    expect(fieldOf(withPatch({ operation: { fluteLengthMm: 2 } }))).toBe("operation.axialDepthMm");
    expect(fieldOf(withPatch({ operation: { fluteLengthMm: 4 }, overrides: { axialDepthMm: 5 } }))).toBe("overrides.axialDepthMm");
    expect(fieldOf(withPatch({ overrides: { stickoutMm: 121 } }))).toBe("overrides.stickoutMm");
    expect(fieldOf(withPatch({ operation: { stickoutMm: 121 } }))).toBe("operation.stickoutMm");
    expect(fieldOf(withPatch({ operation: { diameterMm: 0.05, radialDepthMm: 0.05 } }))).toBe("operation.diameterMm");
    expect(fieldOf(withPatch({ operation: { diameterMm: 120, radialDepthMm: 120 } }))).toBe("operation.diameterMm");
  });

  it("fires: warns about a stick-out shorter than the flute length, naming the field", () => {
    const w = adaptRecipe(withPatch({ operation: { fluteLengthMm: 25 } })).warnings.find((x) => x.code === "stickout-below-flute-length");
    expect(w?.field).toBe("operation.stickoutMm");
  });

  it("states limits in the caller's units", () => {
    expect(() => adaptRecipe(withPatch({ operation: { fluteLengthMm: 2 }, options: { messageUnits: "imperial" } }))).toThrowError(
      /0\.118\sin.*0\.0787\sin/,
    );
  });

  it("does not fire inside the limits", () => {
    const r = adaptRecipe(withPatch({ operation: { fluteLengthMm: 15, stickoutMm: 20 } }));
    expect(codes(r)).toEqual(["standard-cautions"]);
    expect(fieldOf(withPatch({ overrides: { stickoutMm: 120 } }))).toBe("no error");
  });
});

describe("rule 13: standard cautions", () => {
  it("fires always, and adds the adapted-values caution when a number changed", () => {
    const r = adaptRecipe(withPatch({ machine: { maxRpm: 12000 } }));
    expect(codes(r)).toEqual(expect.arrayContaining(["standard-cautions", "values-adapted"]));
    expect(codes(r).at(-1)).toBe("standard-cautions");
  });

  it("does not add the adapted-values caution when nothing changed", () => {
    expect(codes(adaptRecipe(baseInput()))).toEqual(["standard-cautions"]);
  });
});

describe("operation kinds", () => {
  it("reads the old key for constant-engagement clearing", () => {
    const input = baseInput();
    const old = adaptRecipe({ ...input, operation: { ...input.operation, kind: "adaptive" as never, radialDepthMm: 0.6 } });
    const current = adaptRecipe({ ...input, operation: { ...input.operation, kind: "constant-engagement", radialDepthMm: 0.6 } });
    expect(old).toEqual(current);
  });
});
