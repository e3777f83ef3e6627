import { describe, expect, it } from "vitest";

import { cuttingPower, kienzleSpecificCuttingForce, materialRemovalRate, spindleTorque, tangentialForce } from "@/lib/machining";

describe("material removal rate (Machinery's Handbook; ISO 3002 quantities)", () => {
  it("Q = ap·ae·vf/1000", () => {
    // 10 mm × 5 mm × 1000 mm/min = 50000 mm³/min = 50 cm³/min
    expect(materialRemovalRate({ axialDepthMm: 10, radialDepthMm: 5, feedMmMin: 1000 })).toBeCloseTo(50, 12);
  });

  it("matches the imperial form Q = w·d·f", () => {
    // 0.5 in × 0.25 in × 20 in/min = 2.5 in³/min = 2.5 × 16.387064 = 40.9677 cm³/min
    expect(materialRemovalRate({ axialDepthMm: 6.35, radialDepthMm: 12.7, feedMmMin: 508 })).toBeCloseTo(40.9677, 4);
  });
});

describe("net cutting power (Machinery's Handbook, power section, unit power form)", () => {
  it("Pc = ap·ae·vf·kc/(60·10⁶·η)", () => {
    // Q = 50 cm³/min = 50000 mm³/min; kc = 2000 N/mm²:
    // 50000 × 2000 / 60e6 = 1.6667 kW at η = 1; / 0.8 = 2.0833 kW at the spindle
    const cut = { axialDepthMm: 10, radialDepthMm: 5, feedMmMin: 1000, specificCuttingForceNmm2: 2000 };
    expect(cuttingPower(cut)).toBeCloseTo(1.66667, 5);
    expect(cuttingPower({ ...cut, efficiency: 0.8 })).toBeCloseTo(2.08333, 5);
  });

  it("refuses an efficiency above 1", () => {
    expect(() =>
      cuttingPower({ axialDepthMm: 1, radialDepthMm: 1, feedMmMin: 1, specificCuttingForceNmm2: 1, efficiency: 1.2 }),
    ).toThrowError(expect.objectContaining({ field: "efficiency" }));
  });
});

describe("Kienzle (1952) specific cutting force", () => {
  it("kc = kc1.1·h^(−mc)", () => {
    // 1500 × 0.1^(−0.25) = 1500 × 10^0.25 = 1500 × 1.778279 = 2667.42 N/mm²
    expect(kienzleSpecificCuttingForce({ kc11Nmm2: 1500, chipThicknessMm: 0.1, mc: 0.25 })).toBeCloseTo(2667.42, 2);
    // at h = 1 mm, kc = kc1.1 by definition
    expect(kienzleSpecificCuttingForce({ kc11Nmm2: 1500, chipThicknessMm: 1, mc: 0.25 })).toBe(1500);
  });
});

describe("torque and force (mechanics, P = M·ω = F·v)", () => {
  it("M = 9549·P/n", () => {
    // 1 kW at 1000 rpm: ω = 2π × 1000/60 = 104.72 rad/s; M = 1000 W / 104.72 = 9.5493 N·m
    expect(spindleTorque({ powerKw: 1, rpm: 1000 })).toBeCloseTo(9.5493, 4);
  });

  it("Fc = 60000·Pc/vc", () => {
    // 1.6667 kW at 100 m/min = 1.6667 m/s: 1666.7 W / 1.6667 m/s = 1000 N
    expect(tangentialForce({ powerKw: 5 / 3, cuttingSpeedMpm: 100 })).toBeCloseTo(1000, 9);
  });
});
