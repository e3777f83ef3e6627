import { describe, expect, it } from "vitest";

import type { AdaptInput } from "@/lib/machining";
import { checkInput } from "@/lib/machining/adapt/check-input";
import { passesInputChecks } from "@/lib/machining/adapt/check-input-fast";

import { baseInput, withPatch } from "./fixtures";

const checkInputAccepts = (input: AdaptInput) => {
  try {
    checkInput(input, "metric");
    return true;
  } catch {
    return false;
  }
};

// The one-pass check must agree with checkInput on every input, valid or not: a fast "yes" on an input
// checkInput refuses would let it through unchecked. Boundary values (exactly D, exactly D/2, ap equal to
// the flute length, a window of one speed, 20·D) are where the two could drift apart.
const cases: [string, AdaptInput][] = [
  ["the base input", baseInput()],
  ["ae exactly D", withPatch({ operation: { radialDepthMm: 6 } })],
  ["ae just above D", withPatch({ operation: { radialDepthMm: 6.0001 } })],
  ["corner radius exactly D/2", withPatch({ operation: { cornerRadiusMm: 3 } })],
  ["corner radius above D/2", withPatch({ operation: { cornerRadiusMm: 3.1 } })],
  ["corner radius negative", withPatch({ operation: { cornerRadiusMm: -0.1 } })],
  ["ap equal to the flute length", withPatch({ operation: { fluteLengthMm: 3 } })],
  ["ap above the flute length", withPatch({ operation: { fluteLengthMm: 2.9 } })],
  ["a window of one speed", withPatch({ material: { cuttingSpeedWindowMpm: [300, 300] } })],
  ["a reversed window", withPatch({ material: { cuttingSpeedWindowMpm: [300, 200] } })],
  ["stick-out exactly 20·D", withPatch({ operation: { stickoutMm: 120 } })],
  ["stick-out above 20·D", withPatch({ overrides: { stickoutMm: 121 } })],
  ["diameter as a string", withPatch({ operation: { diameterMm: "6" as never } })],
  ["diameter NaN", withPatch({ operation: { diameterMm: Number.NaN } })],
  ["diameter below the range", withPatch({ operation: { diameterMm: 0.05, radialDepthMm: 0.05 } })],
  ["fractional flutes", withPatch({ operation: { flutes: 1.5 } })],
  ["infinite rpm", withPatch({ operation: { rpm: Number.POSITIVE_INFINITY } })],
  ["unknown corner form", withPatch({ operation: { cornerForm: "round" as never } })],
  ["legacy kind key", withPatch({ operation: { kind: "adaptive" as never } })],
  ["unknown kind", withPatch({ operation: { kind: "knurling" as never } })],
  ["mc of 1", withPatch({ material: { mc: 1 } })],
  ["mc of 0", withPatch({ material: { mc: 0 } })],
  ["band reversed", withPatch({ material: { chipLoadPctOfD: { min: 0.03, max: 0.01 } } })],
  ["machine min above max", withPatch({ machine: { minRpm: 30000 } })],
  ["unknown spindle kind", withPatch({ machine: { spindleKind: "servo" as never } })],
  ["unknown entry capability", { ...baseInput(), entryCapability: "dive" as never }],
  ["ap override above the flute", withPatch({ operation: { fluteLengthMm: 5 }, overrides: { axialDepthMm: 6 } })],
  ["ae override above D", withPatch({ overrides: { radialDepthMm: 7 } })],
  ["a null band", withPatch({ material: { chipLoadPctOfD: null as never } })],
];

describe("passesInputChecks agrees with checkInput", () => {
  it.each(cases)("%s", (_name, input) => {
    expect(passesInputChecks(input)).toBe(checkInputAccepts(input));
  });

  it("says no to a missing section without throwing, so checkInput names it", () => {
    const input = { ...baseInput(), machine: undefined as never };
    expect(passesInputChecks(input)).toBe(false);
    expect(checkInputAccepts(input)).toBe(false);
  });
});
