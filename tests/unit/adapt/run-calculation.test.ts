import { describe, expect, it } from "vitest";

import { runCalculation } from "@/lib/adapt/calculate/run-calculation";

// 1/4 in two-flute cutter, 18000 rpm, 70 in/min: fz = 70 / (2 × 18000) = 0.001944 in.
const imperialBody = () => ({
  units: "imperial",
  operation: {
    kind: "profile",
    diameter: { value: 0.25, unit: "in" },
    flutes: 2,
    spindleSpeed: { value: 18000, unit: "rpm" },
    feed: { value: 70, unit: "in/min" },
    axialDepth: { value: 0.25, unit: "in" },
    radialDepth: { value: 0.125, unit: "in" },
    plungeFeed: { value: 20, unit: "in/min" },
    stickout: { value: 1, unit: "in" },
  },
  material: {
    cuttingSpeedWindow: { min: 500, max: 1500, unit: "SFM" },
    minChipLoad: { value: 0.001, unit: "in/tooth" },
    specificCuttingForce: { value: 150, unit: "N/mm2" },
  },
  referenceMachine: { rigidity: 0.8 },
  machine: {
    spindleSpeed: { min: 8000, max: 12000, unit: "rpm" },
    maxFeed: { value: 200, unit: "in/min" },
    spindlePower: { value: 1.5, unit: "hp" },
    rigidity: 0.8,
    zThrust: { value: 50, unit: "lbf" },
  },
});

describe("runCalculation", () => {
  it("takes an imperial body and returns both systems, warnings and steps", () => {
    const outcome = runCalculation(imperialBody());
    if (!outcome.ok) throw new Error(JSON.stringify(outcome.errors));
    const { metric, imperial, steps, warnings, units } = outcome.result;
    expect(units).toBe("imperial");
    // rpm clamps to 12000; fz held: 0.0019444 in × 2 × 12000 = 46.67 in/min = 1185.3 mm/min
    expect(metric.spindleSpeed?.value).toBe(12000);
    expect(imperial.feed?.value).toBeCloseTo(46.667, 3);
    expect(metric.feed?.value).toBeCloseTo(46.667 * 25.4, 1);
    expect(imperial.feed?.text).toBe("46.7\u00a0in/min");
    expect(metric.feed?.unit).toBe("mm/min");
    // vc = π × 0.25 × 12000 / 12 = 785.4 SFM
    expect(imperial.cuttingSpeed?.value).toBeCloseTo(785.4, 1);
    expect(imperial.radialDepth?.text).toBe("0.125\u00a0in");
    expect(metric.radialDepth?.text).toBe("3.175\u00a0mm");
    const rpmStep = steps.find((s) => s.field === "spindleSpeed");
    expect(rpmStep?.rule).toBe("spindle-speed-range");
    expect(rpmStep?.before.imperial.value).toBe(18000);
    expect(rpmStep?.title).toBe("Spindle speed range");
    expect(warnings.map((w) => w.code)).toContain("standard-cautions");
  });

  it("gives field errors naming the body path for bad input", () => {
    const body = imperialBody();
    const outcome = runCalculation({
      ...body,
      operation: { ...body.operation, diameter: { value: -1, unit: "ft" }, flutes: 2.5 },
      extra: true,
    });
    expect(outcome.ok).toBe(false);
    if (outcome.ok) return;
    expect(outcome.status).toBe(400);
    expect(Object.keys(outcome.errors)).toEqual(
      expect.arrayContaining(["operation.diameter.value", "operation.diameter.unit", "operation.flutes", "body"]),
    );
    expect(outcome.message).toMatch(/invalid/i);
  });

  it("maps an engine refusal to the body path, in the caller's units", () => {
    const body = imperialBody();
    // 0.3 in radial depth on a 0.25 in cutter: an imperial caller reads inches (model 1 answered 7.62 mm)
    const outcome = runCalculation({ ...body, operation: { ...body.operation, radialDepth: { value: 0.3, unit: "in" } } });
    if (outcome.ok) throw new Error("expected an error");
    expect(outcome.errors["operation.radialDepth.value"]?.[0]).toMatch(
      /^operation\.radialDepth\.value \(0\.3\sin\) cannot exceed the cutter diameter \(0\.25\sin\)/,
    );
    const metric = runCalculation({ ...body, units: "metric", operation: { ...body.operation, radialDepth: { value: 0.3, unit: "in" } } });
    if (metric.ok) throw new Error("expected an error");
    expect(metric.errors["operation.radialDepth.value"]?.[0]).toMatch(/\(7\.62\smm\)/);
  });

  it("maps min above max on the spindle range", () => {
    const body = imperialBody();
    const outcome = runCalculation({ ...body, machine: { ...body.machine, spindleSpeed: { min: 20000, max: 10000, unit: "rpm" } } });
    if (outcome.ok) throw new Error("expected an error");
    expect(Object.keys(outcome.errors)).toEqual(["machine.spindleSpeed.max"]);
  });

  it("refuses a body that is not an object", () => {
    const outcome = runCalculation("hello");
    expect(outcome.ok).toBe(false);
    if (!outcome.ok) expect(outcome.errors.body).toBeDefined();
  });

  it("accepts a metric body with mixed units", () => {
    const body = imperialBody();
    const outcome = runCalculation({
      ...body,
      units: "metric",
      operation: { ...body.operation, diameter: { value: 6.35, unit: "mm" }, feed: { value: 1.778, unit: "m/min" } },
      machine: { ...body.machine, spindlePower: { value: 1100, unit: "W" }, zThrust: { value: 220, unit: "N" } },
    });
    if (!outcome.ok) throw new Error(JSON.stringify(outcome.errors));
    // 1.778 m/min = 70 in/min, so the same adapted feed as the imperial body
    expect(outcome.result.imperial.feed?.value).toBeCloseTo(46.667, 3);
    expect(outcome.result.units).toBe("metric");
  });

  it("takes model 2's inputs with units and answers warnings in the caller's units", () => {
    const body = imperialBody();
    const outcome = runCalculation({
      ...body,
      operation: {
        ...body.operation,
        kind: "adaptive",
        fluteLength: { value: 0.75, unit: "in" },
        cornerForm: "square",
        entry: "plunge",
        plungeFeed: { value: 30, unit: "in/min" },
      },
      material: {
        ...body.material,
        specificCuttingForce: undefined,
        kc11: { value: 120, unit: "N/mm²" },
        mc: 0,
        chipLoadBand: { min: 1.2, max: 3, unit: "% of D" },
        meltsWhenRubbing: true,
      },
      machine: {
        ...body.machine,
        spindleSpeed: { min: 10000, max: 10000, unit: "rpm" },
        zThrust: undefined,
        rigidityClass: "light",
        spindleKind: "constant-torque",
        ratedSpindleSpeed: { value: 10000, unit: "rpm" },
      },
      entryCapability: "plunge-only",
    });
    if (!outcome.ok) throw new Error(JSON.stringify(outcome.errors));
    const { imperial, warnings } = outcome.result;
    // light class: 150 N assumed; fn = 0.0281 mm/rev at 10 000 rpm = 11.1 in/min (the calibration)
    expect(imperial.plungeFeed?.value).toBeCloseTo(11.07, 1);
    expect(imperial.plungeFeedPerRev?.unit).toBe("in/rev");
    expect(imperial.axialDepth?.value).toBeCloseTo(0.25 / 4, 9); // plunge-only in a melting material: D/4
    const plunge = warnings.find((w) => w.code === "plunge-thrust-limited");
    expect(plunge?.message).toMatch(/in\/min.*lbf/);
    expect(plunge?.message).not.toMatch(/mm\/min/);
    expect(warnings.map((w) => w.code)).toEqual(expect.arrayContaining(["ramp-entry-recommended", "plunge-only-shallow-passes"]));
  });
});
