import { describe, expect, it } from "vitest";

import { sheetFrontMatterSchema } from "@/content-schema/sheet-front-matter";
import { diffParameters, formatParameterChange, hasParameterChanges } from "@/lib/sheets/parameter-diff";
import { frontMatterInput, operationInput } from "@/tests/factories/sheet-source";

const fm = (ops: Record<string, unknown>[]) => sheetFrontMatterSchema.parse(frontMatterInput({ operations: ops }));
const cutter = { flutes: 2, diameterMm: 6 };

describe("diffParameters", () => {
  it("finds no change between equal versions", () => {
    const a = fm([operationInput()]);
    expect(hasParameterChanges(diffParameters(a, a, cutter))).toBe(false);
  });

  it("reports a changed feed with its absolute and relative change, and the derived fz", () => {
    const diff = diffParameters(fm([operationInput({ vf: "1800 mm/min" })]), fm([operationInput({ vf: "1620 mm/min" })]), cutter);
    expect(diff[0].status).toBe("changed");
    const params = diff[0].changes.map((c) => c.parameter);
    expect(params).toEqual(["vf", "fz"]);
    const vf = diff[0].changes[0];
    expect(vf.delta).toBe(-180);
    expect(vf.percent).toBeCloseTo(-10, 10);
    // fz = vf / (z·n): 1800/(2·18000) = 0.05 mm → 1620/(2·18000) = 0.045 mm (lib/machining/README.md, vf = fz·z·n).
    const fz = diff[0].changes[1];
    expect(fz.before).toBeCloseTo(0.05, 12);
    expect(fz.after).toBeCloseTo(0.045, 12);
  });

  it("compares ae given as a percentage of D with ae in mm, through the cutter diameter", () => {
    // 50 % of a 6 mm cutter is 3 mm: no change.
    const same = diffParameters(fm([operationInput({ ae: "50 %" })]), fm([operationInput({ ae: "3 mm" })]), cutter);
    expect(same[0].status).toBe("unchanged");
  });

  it("matches operations by kind and label, so reordering is no change, and reports added and removed ones", () => {
    const slot = operationInput();
    const profile = operationInput({ kind: "profile", label: "Outside profile", ae: "0.5 mm", entry: "none", rampAngleDeg: undefined });
    const finish = operationInput({ kind: "finishing", label: "Finish", ae: "0.2 mm", entry: "none", rampAngleDeg: undefined });
    const diff = diffParameters(fm([slot, profile]), fm([profile, finish]), cutter);
    expect(diff.map((d) => [d.label, d.status])).toEqual([
      ["Outside profile", "unchanged"],
      ["Finish", "added"],
      ["Full-width slot", "removed"],
    ]);
  });

  it("formats a change in imperial units with a sign (1 in = 25.4 mm)", () => {
    const diff = diffParameters(fm([operationInput({ ap: "2.54 mm" })]), fm([operationInput({ ap: "5.08 mm" })]), cutter);
    const text = formatParameterChange(diff[0].changes[0], "imperial");
    expect(text).toMatchObject({ before: "0.1\u00a0in", after: "0.2\u00a0in", delta: "+0.1\u00a0in", percent: "+100.0\u00a0%" });
    expect(formatParameterChange(diff[0].changes[0], "metric").delta).toBe("+2.54\u00a0mm");
  });

  it("reports an entry change as text", () => {
    const diff = diffParameters(fm([operationInput({ entry: "ramp" })]), fm([operationInput({ entry: "helical" })]), cutter);
    expect(formatParameterChange(diff[0].changes[0], "metric")).toMatchObject({ before: "Ramp", after: "Helix", delta: "" });
  });
});
