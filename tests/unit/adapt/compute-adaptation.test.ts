import { describe, expect, it } from "vitest";

import { computeAdaptation, readAdhocMachine } from "@/lib/adapt/compute-adaptation";

import { acrylicContext } from "./adapt-context-fixture";

const weak = {
  rpmMin: "10000",
  rpmMax: "16000",
  power: "0.8",
  maxFeed: "3000",
  rigidity: "light" as const,
  zThrust: "",
  stickout: "",
  spindleKind: "constant-torque" as const,
  ratedRpm: "",
};
const none = { ae: "", ap: "", stickout: "" };

describe("computeAdaptation", () => {
  it("clamps n to the machine and scales vf with it (vf = fz·z·n, ISO 3002-1)", () => {
    const errors = {};
    const machine = readAdhocMachine(weak, "metric", errors);
    const out = computeAdaptation({ context: acrylicContext, operationIndex: 0, machine, overrides: none, units: "metric", errors });
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    expect(out.result.rpm).toBe(16000);
    // fz = 1800 / (1 · 18000) = 0.1 mm → vf = 0.1 · 1 · 16000.
    expect(out.result.feedMmMin).toBeCloseTo(1600, 9);
  });

  it("reads imperial machines: 3 hp = 2.237 kW (550 ft·lbf/s), 120 in/min = 3048 mm/min", () => {
    const errors = {};
    const machine = readAdhocMachine({ ...weak, power: "3", maxFeed: "120" }, "imperial", errors);
    expect(machine?.spindlePowerKw).toBeCloseTo(3 * 0.74569987158227022, 9);
    expect(machine?.maxFeedMmMin).toBeCloseTo(120 * 25.4, 9);
  });

  it("turns every bad field into a message and never returns a number for it", () => {
    const errors: Record<string, string> = {};
    const machine = readAdhocMachine({ ...weak, rpmMax: "", power: "-1", maxFeed: "fast" }, "metric", errors);
    expect(machine).toBeNull();
    expect(Object.keys(errors).sort()).toEqual(["maxFeed", "power", "rpmMax"]);
    const out = computeAdaptation({
      context: acrylicContext,
      operationIndex: 0,
      machine,
      overrides: { ...none, ae: "1/0" },
      units: "metric",
      errors,
    });
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(out.errors.ae).toBeTruthy();
    expect(JSON.stringify(out)).not.toMatch(/NaN|Infinity/);
  });

  it("refuses an ae below 5 % of D with the engine's message on the ae field", () => {
    const errors = {};
    const machine = readAdhocMachine(weak, "metric", errors);
    // 5 % of 3.175 mm is 0.159 mm; 0.1 mm is below it (lib/machining/README.md, rule 2).
    const out = computeAdaptation({
      context: acrylicContext,
      operationIndex: 0,
      machine,
      overrides: { ...none, ae: "0.1 mm" },
      units: "metric",
    });
    expect(out.ok).toBe(false);
    if (!out.ok) expect(Object.keys(out.errors)).toEqual(["ae"]);
  });
});
