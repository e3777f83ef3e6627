import { describe, expect, it } from "vitest";

import {
  ballNoseEffectiveDiameter,
  MachiningInputError,
  roundBarInertia,
  scallopHeight,
  stepoverForScallop,
  stickoutForDeflection,
  toolDeflection,
} from "@/lib/machining";

// Cantilever with a load at the free end: δmax = P·L³/(3·E·I) (Gere & Goodno, Mechanics of
// Materials, table of beam deflections); round section I = π·d⁴/64.
describe("tool deflection", () => {
  it("I = π·d⁴/64", () => {
    // d = 8 mm: π × 4096 / 64 = 64π = 201.062 mm⁴
    expect(roundBarInertia(8)).toBeCloseTo(201.062, 3);
  });

  it("δ = F·L³/(3·E·I) with the 0.8·D fluted section", () => {
    // F = 100 N, L = 30 mm, E = 600 GPa = 600000 N/mm², De = 0.8 × 10 = 8 mm, I = 201.062 mm⁴:
    // 100 × 27000 / (3 × 600000 × 201.062) = 2.7e6 / 3.61911e8 = 0.0074604 mm
    expect(toolDeflection({ forceN: 100, stickoutMm: 30, diameterMm: 10, youngsModulusGPa: 600 })).toBeCloseTo(0.0074604, 7);
  });

  it("uses the given effective diameter ratio", () => {
    // solid 10 mm bar: I = π × 10⁴/64 = 490.874 mm⁴; 2.7e6 / (3 × 600000 × 490.874) = 0.0030558 mm
    expect(toolDeflection({ forceN: 100, stickoutMm: 30, diameterMm: 10, youngsModulusGPa: 600, effectiveDiameterRatio: 1 })).toBeCloseTo(
      0.0030558,
      7,
    );
  });

  it("inverts to the stick-out for a given deflection", () => {
    // δ ∝ L³: doubling the allowed deflection allows ∛2 × 30 = 37.798 mm
    expect(stickoutForDeflection({ forceN: 100, deflectionMm: 2 * 0.0074604, diameterMm: 10, youngsModulusGPa: 600 })).toBeCloseTo(
      37.798,
      2,
    );
  });

  it("refuses a negative stick-out", () => {
    expect(() => toolDeflection({ forceN: 1, stickoutMm: -1, diameterMm: 1, youngsModulusGPa: 600 })).toThrowError(
      expect.objectContaining({ field: "stickoutMm" }),
    );
  });
});

// Geometry of a sphere (Machinery's Handbook, ball end mills): chord of a circle at depth ap.
describe("ball-nose geometry", () => {
  it("De = 2·√(ap·(D − ap))", () => {
    // D = 10, ap = 1: 2 × √(1 × 9) = 6 mm
    expect(ballNoseEffectiveDiameter({ diameterMm: 10, axialDepthMm: 1 })).toBeCloseTo(6, 12);
    // from ap = D/2 on, the full diameter cuts
    expect(ballNoseEffectiveDiameter({ diameterMm: 10, axialDepthMm: 7 })).toBe(10);
  });

  it("h = R − √(R² − (s/2)²)", () => {
    // R = 5, s = 6: 5 − √(25 − 9) = 5 − 4 = 1 mm
    expect(scallopHeight({ diameterMm: 10, stepoverMm: 6 })).toBeCloseTo(1, 12);
    // R = 5, s = 2: 5 − √24 = 5 − 4.898979 = 0.101021 mm
    expect(scallopHeight({ diameterMm: 10, stepoverMm: 2 })).toBeCloseTo(0.101021, 6);
    // s = 2·√(h·(2R − h)): h = 1 gives 2 × √9 = 6
    expect(stepoverForScallop({ diameterMm: 10, scallopHeightMm: 1 })).toBeCloseTo(6, 12);
  });

  it("refuses a stepover wider than the ball", () => {
    expect(() => scallopHeight({ diameterMm: 10, stepoverMm: 11 })).toThrowError(MachiningInputError);
  });
});
