import { unit } from "mathjs";
import { describe, expect, it } from "vitest";

import * as u from "@/lib/machining";

// NIST SP 811 (2008), appendix B: exact and rounded conversion factors.
describe("unit constants (NIST SP 811)", () => {
  it("defines the inch and foot exactly", () => {
    expect(u.MM_PER_INCH).toBe(25.4); // NIST SP 811 B.8: 1 in = 2.54 × 10⁻² m exactly
    expect(u.M_PER_FOOT).toBe(0.3048); // NIST SP 811 B.8: 1 ft = 3.048 × 10⁻¹ m exactly
    expect(u.MM_PER_FOOT).toBe(304.8);
  });

  it("derives pound-force, horsepower and cubic inch", () => {
    // NIST SP 811: 1 lbf = 4.448 222 N (0.45359237 kg × 9.80665 m/s²)
    expect(u.N_PER_LBF).toBeCloseTo(4.448222, 6);
    // NIST SP 811: 1 hp (550 ft·lbf/s) = 745.6999 W
    expect(u.W_PER_HP).toBeCloseTo(745.6999, 4);
    // NIST SP 811: 1 in³ = 1.638 706 4 × 10⁻⁵ m³ = 16.387064 cm³ exactly (25.4³ / 1000)
    expect(u.CM3_PER_IN3).toBeCloseTo(25.4 ** 3 / 1000, 12);
    // NIST SP 811: 1 psi = 6.894 757 kPa = 0.006894757 N/mm²
    expect(u.NMM2_PER_PSI).toBeCloseTo(0.006894757, 9);
  });
});

describe("conversions cross-checked against mathjs units", () => {
  const cases: [string, (v: number) => number, string, string, number][] = [
    ["in → mm", u.inToMm, "in", "mm", 0.25],
    ["mm → in", u.mmToIn, "mm", "in", 6.35],
    ["in/min → mm/min", u.inMinToMmMin, "in/min", "mm/min", 72],
    ["mm/min → in/min", u.mmMinToInMin, "mm/min", "in/min", 1800],
    ["SFM → m/min", u.sfmToMpm, "ft/min", "m/min", 600],
    ["m/min → SFM", u.mpmToSfm, "m/min", "ft/min", 199.5],
    ["hp → kW", u.hpToKw, "hp", "kW", 2.2],
    ["kW → hp", u.kwToHp, "kW", "hp", 1.5],
    ["lbf → N", u.lbfToN, "lbf", "N", 50],
    ["N → lbf", u.nToLbf, "N", "lbf", 200],
    ["N·m → lbf·ft", u.nmToLbfFt, "N m", "lbf ft", 3],
    ["cm³/min → in³/min", u.cm3ToIn3, "cm^3", "in^3", 40],
    ["psi → N/mm²", u.psiToNmm2, "psi", "N/mm^2", 100000],
  ];
  // Relative: mathjs stores psi rounded to 12 digits.
  it.each(cases)("%s", (_name, convert, from, to, value) => {
    const reference = unit(value, from).toNumber(to);
    expect(Math.abs(convert(value) - reference) / reference).toBeLessThan(1e-9);
  });

  it("converts 72 in/min to 1828.8 mm/min (72 × 25.4)", () => {
    expect(u.inMinToMmMin(72)).toBeCloseTo(1828.8, 10);
    expect(unit(72, "in/min").toNumber("mm/min")).toBeCloseTo(1828.8, 10);
  });

  it("round-trips every quantity kind through toImperial and toMetric", () => {
    for (const kind of u.QUANTITY_KINDS) {
      const imperial = u.toImperial(123.456, kind);
      expect(imperial.unit).toBe(u.unitOf(kind, "imperial"));
      expect(u.toMetric(imperial.value, kind).value).toBeCloseTo(123.456, 9);
    }
  });
});
