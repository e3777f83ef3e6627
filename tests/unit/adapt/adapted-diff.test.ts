import { describe, expect, it } from "vitest";

import { adaptOperation } from "@/lib/adapt/adapt-context";
import { diffAdapted, formatAdaptedChange } from "@/lib/adapt/adapted-diff";

import { acrylicContext } from "./adapt-context-fixture";

const machine = { minRpm: 10000, maxRpm: 16000, spindlePowerKw: 0.8, maxFeedMmMin: 3000, rigidity: 0.35 };

describe("diffAdapted", () => {
  it("lists only the numbers that changed, with the change in percent", () => {
    const before = adaptOperation(acrylicContext, 0, machine);
    const lowered = {
      ...acrylicContext,
      operations: acrylicContext.operations.map((op) => (op.index === 0 ? { ...op, feedMmMin: 1440 } : op)),
    };
    const after = adaptOperation(lowered, 0, machine);
    const changes = diffAdapted(before, after);
    // fz 0.1 → 0.08 mm at 16 000 rpm: vf 1600 → 1280 mm/min, −20 %.
    expect(changes.map((c) => c.field)).toEqual(["feedMmMin", "chipLoadMm"]);
    expect(changes[0].before).toBeCloseTo(1600, 9);
    expect(changes[0].after).toBeCloseTo(1280, 9);
    expect(changes[0].percent).toBeCloseTo(-20, 9);
    expect(formatAdaptedChange(changes[0], "metric").percent).toBe("-20.0\u00a0%");
    expect(diffAdapted(before, before)).toEqual([]);
  });
});
