import { describe, expect, it } from "vitest";

import {
  ballNoseEffectiveDiameter,
  chipLoadBand,
  defaultZThrustN,
  kienzleKc,
  MachiningInputError,
  maxChipThickness,
  meanChipThickness,
  normalizeOperationKind,
  peakToothForce,
  plungeFeedPerRevForThrust,
  plungeThrustN,
  rigidityClassFromFactor,
  SLOTTING_FACTOR,
  spindlePowerAt,
} from "@/lib/machining";

describe("chip thickness (Altintas, Manufacturing Automation, ch. 2)", () => {
  it("hm = 2·fz/π in a full slot", () => {
    expect(meanChipThickness({ diameterMm: 10, radialDepthMm: 10, chipLoadMm: 0.1 })).toBeCloseTo(0.2 / Math.PI, 12);
  });

  it("hm = fz·(1 − cos φs)/φs at ae = D/4, where φs = arccos(0.5) = π/3", () => {
    // fz · 0.5 / (π/3) = 0.1 × 1.5 / π = 0.047746 mm
    expect(meanChipThickness({ diameterMm: 10, radialDepthMm: 2.5, chipLoadMm: 0.1 })).toBeCloseTo(0.15 / Math.PI, 12);
  });

  it("hex = fz·sin φs under half width, fz from there on", () => {
    expect(maxChipThickness({ diameterMm: 10, radialDepthMm: 2.5, chipLoadMm: 0.1 })).toBeCloseTo(0.1 * Math.sin(Math.PI / 3), 12);
    expect(maxChipThickness({ diameterMm: 10, radialDepthMm: 7, chipLoadMm: 0.1 })).toBe(0.1);
  });
});

describe("Kienzle specific cutting force (Kienzle, 1952)", () => {
  it("kc(h) = kc1.1·h^(−mc): 1500 N/mm² at h = 0.1 mm with mc = 0.25 is 2667.4 N/mm²", () => {
    expect(kienzleKc({ kc11Nmm2: 1500, mc: 0.25, chipThicknessMm: 0.1 })).toBeCloseTo(2667.42, 2);
    expect(kienzleKc({ kc11Nmm2: 1500, mc: 0.25, chipThicknessMm: 1 })).toBe(1500);
  });

  it("a constant kc (mc = 0) is the same at every h", () => {
    expect(kienzleKc({ kc11Nmm2: 800, mc: 0, chipThicknessMm: 0.01 })).toBe(800);
  });
});

describe("peak tooth force (Altintas ch. 2; Kr = 0.3 from memory)", () => {
  it("F_peak = kc(hex)·ap·hex·ze·√(1 + Kr²) with ze = max(1, z·φs/2π)", () => {
    // slot, D 10, ap 5, fz 0.1, four flutes: ze = 2; 2000 × 5 × 0.1 × 2 × √1.09 = 2088.06 N
    expect(peakToothForce({ diameterMm: 10, radialDepthMm: 10, axialDepthMm: 5, chipLoadMm: 0.1, flutes: 4, kc11Nmm2: 2000 })).toBeCloseTo(
      2088.06,
      2,
    );
  });

  it("never counts fewer than one tooth in the cut", () => {
    // ae = D/4 with two flutes: z·φs/2π = 1/3, so ze = 1; hex = 0.1 × sin 60°
    const hex = 0.1 * Math.sin(Math.PI / 3);
    expect(
      peakToothForce({
        diameterMm: 10,
        radialDepthMm: 2.5,
        axialDepthMm: 5,
        chipLoadMm: 0.1,
        flutes: 2,
        kc11Nmm2: 2000,
        radialForceRatio: 0,
      }),
    ).toBeCloseTo(2000 * 5 * hex, 9);
  });
});

describe("spindle power at speed (electric drives: V/f control holds torque below base speed, common practice)", () => {
  it("P(n) = P·min(1, n/n_rated) for a constant-torque spindle", () => {
    expect(spindlePowerAt({ ratedPowerKw: 2.2, rpm: 12000, ratedRpm: 24000 })).toBeCloseTo(1.1, 12);
    expect(spindlePowerAt({ ratedPowerKw: 2.2, rpm: 30000, ratedRpm: 24000 })).toBe(2.2);
  });

  it("P(n) = P for a constant-power spindle", () => {
    expect(spindlePowerAt({ ratedPowerKw: 2.2, rpm: 6000, ratedRpm: 24000, spindleKind: "constant-power" })).toBe(2.2);
  });
});

describe("plunge thrust: the form of Machinery's Handbook's drilling-thrust formula, coefficients calibrated", () => {
  it("Ff = A·kc·D·fn^0.8 + B·kc·D² (A = 2.1, B = 0.012)", () => {
    // 2.1 × 120 × 6.35 × 0.028^0.8 + 0.012 × 120 × 6.35² = 91.61 + 58.06 = 149.67 N
    expect(plungeThrustN({ diameterMm: 6.35, kcNmm2: 120, feedPerRevMm: 0.028 })).toBeCloseTo(149.67, 1);
  });

  it("inverts to the fn that meets a thrust, or null where the centre term alone exceeds it", () => {
    const fn = plungeFeedPerRevForThrust({ diameterMm: 6.35, kcNmm2: 120, zThrustN: 150 })!;
    expect(plungeThrustN({ diameterMm: 6.35, kcNmm2: 120, feedPerRevMm: fn })).toBeCloseTo(150, 9);
    expect(plungeFeedPerRevForThrust({ diameterMm: 12, kcNmm2: 800, zThrustN: 400 })).toBeNull(); // centre 1382 N
  });
});

describe("ball nose (geometry of a sphere; Machinery's Handbook)", () => {
  it("De = 2·√(ap·(D − ap)): a 6 mm ball at 0.2 mm cuts on 2.154 mm", () => {
    expect(ballNoseEffectiveDiameter({ diameterMm: 6, axialDepthMm: 0.2 })).toBeCloseTo(2.154066, 6);
  });
});

describe("chip load band (common practice, from memory)", () => {
  const material = { minChipLoadMm: 0.02, chipLoadPctOfD: { min: 0.012, max: 0.03 } };

  it("fzMin = max(floor, min·D), fzMax = max·D", () => {
    const band = chipLoadBand(material, 6);
    expect(band.minMm).toBeCloseTo(0.072, 15);
    expect(band.maxMm).toBeCloseTo(0.18, 15);
    expect(band.impossible).toBe(false);
    const small = chipLoadBand(material, 1);
    expect(small.minMm).toBe(0.02);
    expect(small.maxMm).toBeCloseTo(0.03, 15);
  });

  it("is impossible where the ceiling falls under the floor", () => {
    expect(chipLoadBand(material, 0.5).impossible).toBe(true);
  });

  it("has no ceiling without a band and no floor without a minimum", () => {
    expect(chipLoadBand({}, 6)).toEqual({ minMm: 0, maxMm: Number.POSITIVE_INFINITY, impossible: false });
  });
});

describe("defaults", () => {
  it("Z thrust by rigidity class: light 150 N, medium 400 N, rigid 1500 N (invented, near common practice)", () => {
    expect([defaultZThrustN("light"), defaultZThrustN("medium"), defaultZThrustN("rigid")]).toEqual([150, 400, 1500]);
  });

  it("rigidity classes from the 0–1 factor: under 0.45 light, under 0.85 medium, else rigid", () => {
    expect([0.35, 0.45, 0.55, 0.75, 0.85, 1].map(rigidityClassFromFactor)).toEqual([
      "light",
      "medium",
      "medium",
      "medium",
      "rigid",
      "rigid",
    ]);
    expect(() => rigidityClassFromFactor(0)).toThrowError(MachiningInputError);
  });

  it("slotting factor 0.75 (common practice: slots at 70–80 % of the pocket feed)", () => {
    expect(SLOTTING_FACTOR).toBe(0.75);
  });

  it("maps the old operation key to the new one and leaves others alone", () => {
    expect(normalizeOperationKind("adaptive")).toBe("constant-engagement");
    expect(normalizeOperationKind("pocket")).toBe("pocket");
    expect(normalizeOperationKind("knurling")).toBe("knurling");
  });
});
