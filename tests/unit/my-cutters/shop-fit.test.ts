import { describe, expect, it } from "vitest";

import { classFits, fittingClassIds } from "@/lib/my-cutters/shop-fit";

// Invented machines against invented classes; the bands are Swarfbook's own (lib/field/coverage-gaps.ts).
const light = { id: "light", rpmMin: 8000, rpmMax: 24000, powerKw: 0.8, rigidity: 0.4 };
const rigid = { id: "rigid", rpmMin: 6000, rpmMax: 24000, powerKw: 2.2, rigidity: 0.7 };

describe("which machine classes fit a customer's machine", () => {
  it("a machine near the class's reference machine fits it", () => {
    expect(classFits({ rpmMin: 6000, rpmMax: 24000, powerKw: 1.5, rigidity: 0.55 }, light)).toBe(true);
    expect(classFits({ rpmMin: 6000, rpmMax: 24000, powerKw: 1.5, rigidity: 0.55 }, rigid)).toBe(true);
  });

  it("a top speed under three quarters of the class's, half its power or a rigidity 0.2 away does not", () => {
    expect(classFits({ rpmMin: 10000, rpmMax: 16000, powerKw: 0.8, rigidity: 0.4 }, light)).toBe(false);
    expect(classFits({ rpmMin: 8000, rpmMax: 24000, powerKw: 0.8, rigidity: 0.4 }, rigid)).toBe(false);
    expect(classFits({ rpmMin: 8000, rpmMax: 24000, powerKw: 0.8, rigidity: 0.65 }, light)).toBe(false);
  });

  it("collects the classes that fit any of the machines, once each", () => {
    const machines = [
      { rpmMin: 8000, rpmMax: 24000, powerKw: 0.8, rigidity: 0.4 },
      { rpmMin: 8000, rpmMax: 24000, powerKw: 0.9, rigidity: 0.45 },
    ];
    expect(fittingClassIds(machines, [light, rigid])).toEqual(["light"]);
    expect(fittingClassIds([], [light, rigid])).toEqual([]);
  });
});
