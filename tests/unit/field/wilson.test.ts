import fc from "fast-check";
import { erf } from "mathjs";
import { describe, expect, it } from "vitest";

import { normalQuantile, wilsonInterval, zForConfidence } from "@/lib/field/wilson";

// Formula: Wilson E. B. (1927), "Probable inference, the law of succession, and statistical inference",
// Journal of the American Statistical Association 22:209–212 (score interval without continuity correction).

/** z for 95 % two-sided, from a standard normal table (common practice). */
const Z95 = 1.959964;

const width = (k: number, n: number, z: number) => {
  const i = wilsonInterval(k, n, z);
  return i.upper - i.lower;
};

/** Standard normal CDF built on mathjs' independent erf: Φ(x) = 0.5·(1 + erf(x/√2)). */
const Phi = (x: number) => 0.5 * (1 + erf(x / Math.SQRT2));

/** Any 0 ≤ k ≤ n with n ≥ 1. */
const counts = fc.integer({ min: 1, max: 5000 }).chain((n) => fc.tuple(fc.integer({ min: 0, max: n }), fc.constant(n)));
const zArb = fc.double({ min: 0.01, max: 6, noNaN: true });

describe("wilsonInterval: published worked examples", () => {
  // Newcombe R. G. (1998), "Two-sided confidence intervals for the single proportion: comparison of seven
  // methods", Statistics in Medicine 17:857–872, Table II, method 3 (Wilson score interval without
  // continuity correction), 95 % (z = 1.959964). The table values below are recalled from memory and were
  // re-derived by hand from Wilson's formula; they agree to the 4 decimals the table prints.
  it.each([
    // [k, n, lower, upper]  — source: Newcombe (1998) Table II, method 3
    [81, 263, 0.2553, 0.3662], // Newcombe (1998) Table II, method 3: 81/263
    [15, 148, 0.0624, 0.1605], // Newcombe (1998) Table II, method 3: 15/148
    [0, 20, 0.0, 0.1611], // Newcombe (1998) Table II, method 3: 0/20
    [1, 29, 0.0061, 0.1718], // Newcombe (1998) Table II, method 3: 1/29
  ])("%i/%i → %f–%f at 95 %% (Newcombe 1998, Table II, method 3)", (k, n, lower, upper) => {
    const i = wilsonInterval(k, n, Z95);
    expect(i.lower).toBeCloseTo(lower, 4);
    expect(i.upper).toBeCloseTo(upper, 4);
    expect(i.share).toBeCloseTo(k / n, 12);
  });

  it("gives exactly 0 as the lower bound when k = 0 and exactly 1 as the upper bound when k = n", () => {
    expect(wilsonInterval(0, 20, Z95).lower).toBe(0);
    expect(wilsonInterval(7, 7, Z95).upper).toBe(1);
    // and the other end is informative, not the trivial 0 or 1
    expect(wilsonInterval(0, 20, Z95).upper).toBeLessThan(1);
    expect(wilsonInterval(7, 7, Z95).lower).toBeGreaterThan(0);
  });

  it("1 failure in 1 report gives 0.21–1 at 95 % (the module's own header example; Wilson 1927 formula)", () => {
    const i = wilsonInterval(1, 1, Z95);
    // Hand derivation: z² = 3.841459; lower = 1 / (1 + z²) = 0.20654.
    expect(i.lower).toBeCloseTo(0.2065, 4);
    expect(i.upper).toBe(1);
    expect(i.share).toBe(1);
  });

  it("n = 0 gives the uninformative 0–1 interval", () => {
    expect(wilsonInterval(0, 0, Z95)).toEqual({ lower: 0, upper: 1, share: 0 });
  });
});

describe("wilsonInterval: the ranking property the product relies on", () => {
  it("1 failure in 1 report has a LOWER lower bound than 30 failures in 100 at 95 % (small numbers are not over-ranked)", () => {
    const one = wilsonInterval(1, 1, Z95);
    const thirty = wilsonInterval(30, 100, Z95);
    // The raw share would rank them the other way round (100 % vs 30 %) …
    expect(one.share).toBeGreaterThan(thirty.share);
    // … the Wilson lower bound does not (0.2065 < 0.2190, hand-derived from Wilson 1927).
    expect(one.lower).toBeLessThan(thirty.lower);
    expect(thirty.lower).toBeCloseTo(0.219, 3);
  });
});

describe("wilsonInterval: properties", () => {
  it("0 ≤ lower ≤ share ≤ upper ≤ 1 for all counts and z", () => {
    fc.assert(
      fc.property(counts, zArb, ([k, n], z) => {
        const i = wilsonInterval(k, n, z);
        expect(i.share).toBe(k / n);
        expect(i.lower).toBeGreaterThanOrEqual(0);
        expect(i.lower).toBeLessThanOrEqual(i.share);
        expect(i.share).toBeLessThanOrEqual(i.upper);
        expect(i.upper).toBeLessThanOrEqual(1);
      }),
    );
  });

  it("k = 0 gives exactly 0 as the lower bound and k = n exactly 1 as the upper bound for every n and z (no rounding dust)", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 5000 }), zArb, (n, z) => {
        expect(wilsonInterval(0, n, z).lower).toBe(0);
        expect(wilsonInterval(n, n, z).upper).toBe(1);
      }),
      { numRuns: 500 },
    );
  });

  it("the interval narrows as n grows at a fixed share", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 50 }).chain((b) => fc.tuple(fc.integer({ min: 0, max: b }), fc.constant(b))),
        fc.integer({ min: 1, max: 20 }),
        fc.integer({ min: 2, max: 20 }),
        zArb,
        ([a, b], m, factor, z) => {
          // a/b is the share; (a·m)/(b·m) and (a·m·factor)/(b·m·factor) have the same share.
          const small = width(a * m, b * m, z);
          const large = width(a * m * factor, b * m * factor, z);
          expect(large).toBeLessThan(small);
        },
      ),
    );
  });

  it("a higher z (higher confidence) widens the interval", () => {
    fc.assert(
      fc.property(
        counts,
        fc.double({ min: 0.05, max: 4, noNaN: true }),
        fc.double({ min: 1.01, max: 3, noNaN: true }),
        ([k, n], z, grow) => {
          expect(width(k, n, z * grow)).toBeGreaterThan(width(k, n, z));
        },
      ),
    );
  });

  it("concrete instance: 95 % is wider than 90 % and narrower than 99 % for 5/20", () => {
    const w90 = width(5, 20, zForConfidence(0.9));
    const w95 = width(5, 20, zForConfidence(0.95));
    const w99 = width(5, 20, zForConfidence(0.99));
    expect(w90).toBeLessThan(w95);
    expect(w95).toBeLessThan(w99);
  });
});

describe("wilsonInterval: refuses impossible input", () => {
  it.each([
    ["k > n", 5, 4],
    ["negative k", -1, 3],
    ["negative n", 0, -1],
    ["negative k and n", -2, -1],
    ["non-integer k", 1.5, 3],
    ["non-integer n", 1, 2.5],
    ["NaN k", Number.NaN, 3],
    ["infinite n", 1, Number.POSITIVE_INFINITY],
  ])("throws RangeError on %s (k=%s, n=%s)", (_label, k, n) => {
    expect(() => wilsonInterval(k, n, Z95)).toThrow(RangeError);
  });

  it.each([0, -1, -Z95, Number.NaN])("throws RangeError when z = %s (z must be > 0)", (z) => {
    expect(() => wilsonInterval(3, 10, z)).toThrow(RangeError);
  });

  it("any k > n is refused", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 1000 }), fc.integer({ min: 1, max: 1000 }), (n, extra) => {
        expect(() => wilsonInterval(n + extra, n, Z95)).toThrow(RangeError);
      }),
    );
  });
});

describe("normalQuantile and zForConfidence", () => {
  // z values from a standard normal table (common practice), to 5 decimals.
  it.each([
    [0.9, 1.644854], // standard normal table: two-sided 90 %
    [0.95, 1.959964], // standard normal table: two-sided 95 %
    [0.99, 2.575829], // standard normal table: two-sided 99 %
  ])("zForConfidence(%f) = %f (standard normal table)", (confidence, z) => {
    expect(zForConfidence(confidence)).toBeCloseTo(z, 5);
  });

  it("normalQuantile(0.5) = 0 (symmetry of the standard normal)", () => {
    expect(Math.abs(normalQuantile(0.5))).toBeLessThan(1e-15);
  });

  it("normalQuantile(0.975) is the table 1.959964 and normalQuantile(0.025) its negative", () => {
    expect(normalQuantile(0.975)).toBeCloseTo(1.959964, 5);
    expect(normalQuantile(0.025)).toBeCloseTo(-1.959964, 5);
  });

  // Cross-check against mathjs' erf (an independent implementation): Φ(normalQuantile(p)) ≈ p.
  it.each([1e-6, 1e-4, 0.001, 0.01, 0.02, 0.02425, 0.025, 0.1, 0.3, 0.5, 0.7, 0.9, 0.975, 0.97575, 0.98, 0.99, 0.999, 0.999999])(
    "Φ(normalQuantile(%f)) ≈ p against mathjs erf",
    (p) => {
      const tail = Math.min(p, 1 - p);
      expect(Math.abs(Phi(normalQuantile(p)) - p)).toBeLessThan(1e-7 * tail);
    },
  );

  it("Φ(normalQuantile(p)) ≈ p for random p in [1e-6, 1 − 1e-6] (mathjs erf)", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 1 - 1e-6, noNaN: true }), (p) => {
        const tail = Math.min(p, 1 - p);
        expect(Math.abs(Phi(normalQuantile(p)) - p)).toBeLessThan(1e-7 * tail);
      }),
    );
  });

  it("is increasing and antisymmetric: q(1 − p) = −q(p)", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 0.5, noNaN: true }), fc.double({ min: 1e-6, max: 0.4, noNaN: true }), (p, step) => {
        expect(normalQuantile(p + step)).toBeGreaterThan(normalQuantile(p));
        expect(normalQuantile(1 - p)).toBeCloseTo(-normalQuantile(p), 7);
      }),
    );
  });

  it.each([0, 1, -0.1, 1.1, Number.NaN])("normalQuantile(%s) throws RangeError", (p) => {
    expect(() => normalQuantile(p)).toThrow(RangeError);
  });
});
