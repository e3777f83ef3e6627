import fc from "fast-check";
import { describe, expect, it } from "vitest";

import { QUANTITIES, QUANTITY_KINDS } from "@/lib/machining";
import { say } from "@/lib/machining/adapt/message-units";

// Messages round to about three significant figures: 0 decimals from 100 up, then one more per decade
// down to 5 decimals under 0.01, trailing zeros dropped. `say` keeps each written number in a table;
// this writes it out the plain way (toFixed on the rounded value) and checks that both agree.
const decimalsFor = (a: number) => (a >= 100 ? 0 : a >= 10 ? 1 : a >= 1 ? 2 : a >= 0.1 ? 3 : a >= 0.01 ? 4 : 5);
function writtenOut(v: number): string {
  const d = decimalsFor(Math.abs(v));
  const scaled = Math.round(Math.abs(v) * 10 ** d);
  const text = String(Number((scaled / 10 ** d).toFixed(d)));
  return v < 0 && scaled > 0 ? `-${text}` : text;
}

describe("say: numbers in messages", () => {
  it.each([
    [0, "0"],
    [-0, "0"],
    [0.000004, "0"],
    [-0.000004, "0"],
    [0.00001, "0.00001"],
    [0.0123456, "0.0123"],
    [0.1, "0.1"],
    [0.30000000000000004, "0.3"],
    [1.005, "1"],
    [9.9996, "10"],
    [99.96, "100"],
    [-12.34, "-12.3"],
    [123.5, "124"],
    [25400, "25400"],
  ])("writes %d as %s", (value, text) => {
    expect(say("metric", value, "length")).toBe(`${text}\u00a0mm`);
    // Twice: the second comes from the table.
    expect(say("metric", value, "length")).toBe(`${text}\u00a0mm`);
  });

  it("agrees with the plain way of writing the rounded number, in both unit systems", () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.constantFrom(...QUANTITY_KINDS), (value, kind) => {
        expect(say("metric", value, kind)).toBe(`${writtenOut(value)}\u00a0${QUANTITIES[kind].metric}`);
        expect(say("imperial", value, kind)).toBe(`${writtenOut(QUANTITIES[kind].toImperial(value))}\u00a0${QUANTITIES[kind].imperial}`);
      }),
      { numRuns: 3000 },
    );
  });
});
