import { describe, expect, it } from "vitest";

import { QUANTITIES, QUANTITY_KINDS } from "@/lib/machining";
import { ROUNDING } from "@/lib/machining/format-rounding";
import { fixed, toPrecision3 } from "@/lib/machining/round-decimal";

import { REFERENCE_ROUNDING, fixed as referenceFixed } from "./format-rounding-reference";

// A fixed seed, so a failure names values that reproduce.
function random(seed: number) {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = Math.imul(s ^ (s >>> 15), 1 | s);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 2 ** 32;
  };
}

const bits = new Float64Array(1);
const raw = new BigInt64Array(bits.buffer);
/** The next double after `x` towards +∞ (`steps` > 0) or −∞. */
function nextDouble(x: number, steps: number): number {
  bits[0] = x;
  raw[0] += BigInt(x >= 0 ? steps : -steps);
  return bits[0];
}

/** Values where rounding is hard: ties at every decimal place, their binary neighbours, powers of ten, noise. */
function hardValues(): number[] {
  const values = [0, -0, 1e-320, 5e-324, 1e15, 2 ** 50, 2 ** 53, 1e21, 1e22, 1.5e300, NaN, Infinity, -Infinity];
  const next = random(20261205);
  for (let decimals = 0; decimals <= 8; decimals++) {
    for (let i = 0; i < 200; i++) {
      const whole = Math.floor(next() * 10 ** (1 + (i % 7)));
      const tie = (whole + 0.5) / 10 ** decimals;
      for (const v of [tie, Number(`${whole}.5e-${decimals}`), whole / 10 ** decimals]) {
        for (let step = -3; step <= 3; step++) values.push(nextDouble(v, step), -nextDouble(v, step));
        values.push(v * (1 + 4e-12), v * (1 - 4e-12), v * (1 + 6e-12), v * (1 - 6e-12));
      }
    }
  }
  for (let e = -12; e <= 22; e++) {
    const p = Number(`1e${e}`);
    for (const m of [1, 9.995, 9.9949999, 9.9950001, 0.9995, 99.95, 999.5]) {
      const v = m * p;
      for (let step = -2; step <= 2; step++) values.push(nextDouble(v, step), -nextDouble(v, step));
    }
  }
  for (let i = 0; i < 10_000; i++) {
    const v = 10 ** (next() * 20 - 9);
    values.push(v, -v, Math.round(v * 1000) / 1000, Math.round(v) + 0.5);
  }
  return values;
}

// Display values reach the rounding after a unit conversion, so the converted values are checked too.
function withConversions(values: number[]): number[] {
  const out = [...values];
  for (const kind of QUANTITY_KINDS) for (const v of values.slice(0, 10_000)) out.push(QUANTITIES[kind].toImperial(v));
  return out;
}

const VALUES = withConversions(hardValues());
// The table composes the primitives checked above on every value; a third of them keeps the run short.
const TABLE_VALUES = VALUES.filter((_, i) => i % 3 === 0);

/** What a call gives back, a thrown error included (the old rounding throws past toFixed's 100 digits). */
function outcome(call: () => string): string {
  try {
    return call();
  } catch (error) {
    return `throws ${error instanceof Error ? error.name : String(error)}`;
  }
}

describe("decimal rounding's fast path", () => {
  it("fixes every value to every decimal place exactly as the string-based rounding does", () => {
    let checked = 0;
    for (let decimals = 0; decimals <= 12; decimals++) {
      for (const v of VALUES) {
        if (fixed(v, decimals) !== referenceFixed(v, decimals))
          expect([v, decimals, fixed(v, decimals)]).toEqual([v, decimals, referenceFixed(v, decimals)]);
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(500_000);
  });

  it("rounds to three significant digits exactly as toPrecision(3) does", () => {
    for (const v of VALUES) {
      const expected = Number(v.toPrecision(3));
      if (!Object.is(toPrecision3(v), expected)) expect([v, toPrecision3(v)]).toEqual([v, expected]);
    }
  });

  it("prints every quantity in both systems character for character as before", () => {
    for (const kind of QUANTITY_KINDS) {
      for (const system of ["metric", "imperial"] as const) {
        for (const v of TABLE_VALUES) {
          const text = outcome(() => ROUNDING[kind][system](v));
          const expected = outcome(() => REFERENCE_ROUNDING[kind][system](v));
          if (text !== expected) expect([kind, system, v, text]).toEqual([kind, system, v, expected]);
        }
      }
    }
  });

  it("rounds ties half away from zero and never prints a negative zero", () => {
    expect(fixed(0.0625, 3)).toBe("0.063");
    expect(fixed(-0.0625, 3)).toBe("-0.063");
    expect(fixed(4.762499999999999, 4)).toBe("4.7625");
    expect(fixed(-0.00001, 3)).toBe("0.000");
    expect(fixed(-0, 0)).toBe("0");
    expect(fixed(1.005, 2)).toBe("1.01");
  });
});
