import { describe, expect, it } from "vitest";

import { baseInput, withPatch } from "./fixtures";
import { fieldOf } from "./helpers";

describe("adaptRecipe refuses impossible input, naming the field", () => {
  it.each([
    ["operation.diameterMm", withPatch({ operation: { diameterMm: 0 } })],
    ["operation.diameterMm", withPatch({ operation: { diameterMm: Number.NaN } })],
    ["operation.flutes", withPatch({ operation: { flutes: 0 } })],
    ["operation.rpm", withPatch({ operation: { rpm: -1 } })],
    ["operation.feedMmMin", withPatch({ operation: { feedMmMin: Number.POSITIVE_INFINITY } })],
    ["operation.axialDepthMm", withPatch({ operation: { axialDepthMm: 0 } })],
    ["operation.radialDepthMm", withPatch({ operation: { radialDepthMm: 7 } })],
    ["operation.kind", withPatch({ operation: { kind: "knurling" as never } })],
    ["material.cuttingSpeedWindowMpm.1", withPatch({ material: { cuttingSpeedWindowMpm: [300, 200] } })],
    ["referenceMachine.rigidity", withPatch({ referenceMachine: { rigidity: 1.5 } })],
    ["machine.maxRpm", withPatch({ machine: { minRpm: 24000, maxRpm: 12000 } })],
    ["machine.spindlePowerKw", withPatch({ machine: { spindlePowerKw: 0 } })],
    ["machine.rigidity", withPatch({ machine: { rigidity: 0 } })],
    ["overrides.radialDepthMm", withPatch({ overrides: { radialDepthMm: 6.1 } })],
    ["overrides.stickoutMm", withPatch({ overrides: { stickoutMm: -5 } })],
    ["options.usablePowerFraction", withPatch({ options: { usablePowerFraction: 0 } })],
    ["options.deflectionLimitMm", withPatch({ options: { deflectionLimitMm: -1 } })],
  ])("%s", (field, input) => {
    expect(fieldOf(input)).toBe(field);
  });

  it("refuses a missing section", () => {
    expect(fieldOf({ ...baseInput(), machine: undefined as never })).toBe("machine");
  });

  it("refuses sizes no machine has, before they can overflow", () => {
    expect(fieldOf(withPatch({ operation: { diameterMm: 1e300, radialDepthMm: 1e300 } }))).toBe("operation.diameterMm");
    expect(fieldOf(withPatch({ machine: { maxRpm: 1e12 } }))).toBe("machine.maxRpm");
  });

  it("refuses a cutter so thin that its deflection cannot be computed", () => {
    // Model 2 refuses cutters outside 0.1–100 mm before any rule runs (rule 12), so the field is named.
    expect(fieldOf(withPatch({ operation: { diameterMm: 1e-300, radialDepthMm: 1e-300 } }))).toBe("operation.diameterMm");
  });
});
