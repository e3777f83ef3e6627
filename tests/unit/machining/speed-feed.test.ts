import { describe, expect, it } from "vitest";

import { chipLoad, cuttingSpeed, feedRate, MachiningInputError, plungeFeed, spindleSpeed } from "@/lib/machining";

describe("cutting speed and spindle speed", () => {
  it("vc = π·D·n/1000 (ISO 3002-1 definition of cutting speed)", () => {
    // D = 10 mm, n = 1000 rpm: π × 10 × 1000 / 1000 = 31.4159 m/min
    expect(cuttingSpeed({ diameterMm: 10, rpm: 1000 })).toBeCloseTo(31.4159, 4);
  });

  it("n = 12·V/(π·D) in imperial units (Machinery's Handbook, speeds and feeds formula)", () => {
    // V = 600 fpm, D = 0.25 in: 12 × 600 / (π × 0.25) = 7200 / 0.785398 = 9167.3 rpm.
    // Same cut in metric: vc = 600 × 0.3048 = 182.88 m/min, D = 6.35 mm.
    expect(spindleSpeed({ diameterMm: 6.35, cuttingSpeedMpm: 182.88 })).toBeCloseTo(9167.3, 1);
  });

  it("n = 1000·vc/(π·D) (ISO 3002-1)", () => {
    // vc = 100 m/min, D = 10 mm: 100000 / 31.4159 = 3183.1 rpm
    expect(spindleSpeed({ diameterMm: 10, cuttingSpeedMpm: 100 })).toBeCloseTo(3183.1, 1);
  });
});

describe("feed rate and chip load", () => {
  it("vf = fz·z·n (Machinery's Handbook, milling feed formula F = f·n·z)", () => {
    // 0.05 mm/tooth × 2 teeth × 18000 rpm = 1800 mm/min
    expect(feedRate({ rpm: 18000, flutes: 2, chipLoadMm: 0.05 })).toBeCloseTo(1800, 9);
    // 0.002 in/tooth × 3 × 10000 rpm = 60 in/min = 1524 mm/min (0.002 in = 0.0508 mm)
    expect(feedRate({ rpm: 10000, flutes: 3, chipLoadMm: 0.0508 })).toBeCloseTo(1524, 9);
  });

  it("fz = vf/(z·n)", () => {
    // 1800 / (2 × 18000) = 0.05 mm/tooth
    expect(chipLoad({ feedMmMin: 1800, rpm: 18000, flutes: 2 })).toBeCloseTo(0.05, 12);
  });

  it("vf_plunge = fn·n (common practice)", () => {
    // 0.1 mm/rev × 3000 rpm = 300 mm/min
    expect(plungeFeed({ feedPerRevMm: 0.1, rpm: 3000 })).toBeCloseTo(300, 9);
  });
});

describe("input checks", () => {
  it.each([0, -1, Number.NaN, Number.POSITIVE_INFINITY])("refuses rpm %d naming the field", (rpm) => {
    expect(() => cuttingSpeed({ diameterMm: 6, rpm })).toThrowError(expect.objectContaining({ field: "rpm" }));
  });

  it("refuses a fractional flute count", () => {
    expect(() => feedRate({ rpm: 1000, flutes: 2.5, chipLoadMm: 0.05 })).toThrowError(MachiningInputError);
  });

  it("refuses a zero diameter", () => {
    expect(() => spindleSpeed({ diameterMm: 0, cuttingSpeedMpm: 100 })).toThrowError(expect.objectContaining({ field: "diameterMm" }));
  });
});
