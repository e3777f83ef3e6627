import fc from "fast-check";
import { describe, expect, it } from "vitest";

import {
  adaptRecipe,
  chipLoadBand,
  OPERATION_KINDS,
  RULE_PIPELINE,
  RULES,
  spindlePowerAt,
  WARNING_CODE_LIST,
  type AdaptInput,
  type AdaptResult,
} from "@/lib/machining";
import { resolveInput } from "@/lib/machining/adapt/resolve-input";
import { createState } from "@/lib/machining/adapt/state";

const num = (min: number, max: number) => fc.double({ min, max, noNaN: true });
const opt = <T>(arb: fc.Arbitrary<T>) => fc.option(arb, { nil: undefined });

/** Any valid input in realistic ranges (ae overrides from 5.1 % of D, clear of the refusal). */
const validInput: fc.Arbitrary<AdaptInput> = fc
  .record({
    kind: fc.constantFrom(...OPERATION_KINDS),
    d: num(0.5, 25),
    z: fc.integer({ min: 1, max: 6 }),
    rpm: num(1000, 40000),
    fz: num(0.002, 0.4),
    apShare: num(0.05, 3),
    aeShare: num(0.01, 1),
    plungeShare: opt(num(0.05, 1)),
    stickShare: opt(num(1.5, 10)),
    window: opt(fc.tuple(num(10, 800), num(1, 3))),
    minChip: opt(num(0.001, 0.2)),
    kc: opt(num(50, 4000)),
    refRigidity: num(0.05, 1),
    minRpm: num(100, 20000),
    rpmSpan: num(0, 40000),
    maxFeed: num(50, 40000),
    power: num(0.05, 30),
    rigidity: num(0.05, 1),
    zThrust: opt(num(5, 5000)),
    aeOverride: opt(num(0.051, 1)),
    apOverride: opt(num(0.05, 4)),
    fluteShare: opt(num(1, 1.5)),
    cornerForm: opt(fc.constantFrom("square" as const, "ball" as const, "corner-radius" as const)),
    band: opt(fc.tuple(num(0.001, 0.02), num(1, 4))),
    kc11: opt(fc.tuple(num(50, 3000), num(0, 0.4))),
    melts: fc.boolean(),
    ratedShare: opt(num(0.2, 1.5)),
    spindleKind: opt(fc.constantFrom("constant-torque" as const, "constant-power" as const)),
    entryCapability: opt(fc.constantFrom("plunge-only" as const, "ramp" as const, "helix" as const)),
  })
  .map((v) => ({
    operation: {
      kind: v.kind,
      diameterMm: v.d,
      flutes: v.z,
      rpm: v.rpm,
      feedMmMin: v.fz * v.z * v.rpm,
      axialDepthMm: v.apShare * v.d,
      radialDepthMm: v.aeShare * v.d,
      plungeFeedMmMin: v.plungeShare === undefined ? undefined : v.plungeShare * v.fz * v.z * v.rpm,
      stickoutMm: v.stickShare === undefined ? undefined : v.stickShare * v.d,
      fluteLengthMm: v.fluteShare === undefined ? undefined : v.fluteShare * v.d * Math.max(v.apShare, v.apOverride ?? 0),
      cornerForm: v.cornerForm,
    },
    material: {
      cuttingSpeedWindowMpm: v.window ? ([v.window[0], v.window[0] * v.window[1]] as const) : undefined,
      minChipLoadMm: v.minChip,
      specificCuttingForceNmm2: v.kc,
      chipLoadPctOfD: v.band ? { min: v.band[0], max: v.band[0] * v.band[1] } : undefined,
      kc11Nmm2: v.kc11?.[0],
      mc: v.kc11?.[1],
      meltsWhenRubbing: v.melts,
    },
    referenceMachine: { rigidity: v.refRigidity },
    machine: {
      minRpm: v.minRpm,
      maxRpm: v.minRpm + v.rpmSpan,
      maxFeedMmMin: v.maxFeed,
      spindlePowerKw: v.power,
      rigidity: v.rigidity,
      zThrustN: v.zThrust,
      ratedRpm: v.ratedShare === undefined ? undefined : v.ratedShare * (v.minRpm + v.rpmSpan),
      spindleKind: v.spindleKind,
    },
    entryCapability: v.entryCapability,
    overrides: {
      radialDepthMm: v.aeOverride === undefined ? undefined : v.aeOverride * v.d,
      axialDepthMm: v.apOverride === undefined ? undefined : v.apOverride * v.d,
    },
  }));

const NUMBERS = [
  "rpm",
  "feedMmMin",
  "chipLoadMm",
  "maxChipThicknessMm",
  "cuttingSpeedMpm",
  "axialDepthMm",
  "radialDepthMm",
  "plungeFeedMmMin",
  "mrrCm3Min",
  "powerKw",
  "torqueNm",
  "forceN",
  "deflectionMm",
  "meanChipThicknessMm",
  "effectiveDiameterMm",
  "peakForceN",
  "availablePowerKw",
  "plungeThrustN",
  "plungeFeedPerRevMm",
] as const;
const TOL = 1 + 1e-12;
const RUNS = { numRuns: 500 };

describe("adaptRecipe properties (fast-check)", () => {
  it("has at most 32 warning codes (the state keeps one bit per code given)", () => {
    expect(WARNING_CODE_LIST.length).toBeLessThanOrEqual(32);
  });

  it("runs the rules of RULE_PIPELINE, in its order (adaptRecipe calls them by name)", () => {
    expect(RULE_PIPELINE.map((rule) => rule.name)).toHaveLength(RULES.length);
    fc.assert(
      fc.property(validInput, (input) => {
        const s = createState(resolveInput(input));
        for (const rule of RULE_PIPELINE) rule(s);
        const r = adaptRecipe(input);
        expect(r.steps).toEqual(s.steps);
        expect(r.warnings).toEqual(s.warnings);
        expect([r.rpm, r.feedMmMin, r.axialDepthMm, r.plungeFeedMmMin, r.deflectionMm]).toEqual([
          s.rpm,
          s.feedMmMin,
          s.axialDepthMm,
          s.plungeFeedMmMin,
          s.deflectionMm,
        ]);
      }),
      RUNS,
    );
  });

  it("never returns NaN or Infinity", () => {
    fc.assert(
      fc.property(validInput, (input) => {
        const r = adaptRecipe(input);
        for (const key of NUMBERS) {
          const value = r[key];
          if (value !== null) expect(Number.isFinite(value), key).toBe(true);
        }
        for (const s of r.steps) expect(Number.isFinite(s.before) && Number.isFinite(s.after)).toBe(true);
      }),
      RUNS,
    );
  });

  it("keeps rpm inside the machine's range, feed and plunge feed under its max feed, depth under the sheet's", () => {
    fc.assert(
      fc.property(validInput, (input) => {
        const r = adaptRecipe(input);
        expect(r.rpm).toBeGreaterThanOrEqual(input.machine.minRpm / TOL);
        expect(r.rpm).toBeLessThanOrEqual(input.machine.maxRpm * TOL);
        expect(r.feedMmMin).toBeLessThanOrEqual(input.machine.maxFeedMmMin * TOL);
        if (r.plungeFeedMmMin !== null) expect(r.plungeFeedMmMin).toBeLessThanOrEqual(input.machine.maxFeedMmMin * TOL);
        expect(r.axialDepthMm).toBeLessThanOrEqual(input.operation.axialDepthMm * TOL);
      }),
      RUNS,
    );
  });

  it("holds the chip load when only the max rpm changes and the feed is not capped", () => {
    fc.assert(
      fc.property(validInput, num(100, 60000), (input, otherMax) => {
        const a = adaptRecipe(input);
        const b = adaptRecipe({ ...input, machine: { ...input.machine, maxRpm: Math.max(input.machine.minRpm, otherMax) } });
        const capped = (r: AdaptResult) => r.warnings.some((w) => w.code === "feed-capped");
        if (!capped(a) && !capped(b)) expect(b.chipLoadMm).toBeCloseTo(a.chipLoadMm, 12);
      }),
      RUNS,
    );
  });

  it("never lowers the axial depth when the spindle has more power", () => {
    fc.assert(
      fc.property(validInput, num(1, 10), (input, factor) => {
        const weak = adaptRecipe(input);
        const strong = adaptRecipe({ ...input, machine: { ...input.machine, spindlePowerKw: input.machine.spindlePowerKw * factor } });
        expect(strong.axialDepthMm).toBeGreaterThanOrEqual(weak.axialDepthMm / TOL);
      }),
      RUNS,
    );
  });

  it("uses only stable warning codes and rule ids, with steps in rule order", () => {
    const order = new Map<string, number>(RULES.map((r) => [r.id, r.order]));
    fc.assert(
      fc.property(validInput, (input) => {
        const r = adaptRecipe(input);
        for (const w of r.warnings) expect(WARNING_CODE_LIST).toContain(w.code);
        const orders = r.steps.map((s) => order.get(s.rule));
        expect(orders.every((o) => o !== undefined)).toBe(true);
        expect(orders).toEqual([...orders].sort((x, y) => x! - y!));
        expect(r.warnings.at(-1)?.code).toBe("standard-cautions");
      }),
      RUNS,
    );
  });

  it("never leaves hex under the band's floor without saying so", () => {
    fc.assert(
      fc.property(validInput, (input) => {
        const r = adaptRecipe(input);
        const floor = chipLoadBand(input.material, input.operation.diameterMm).minMm;
        const said = r.warnings.some((w) => w.code === "chip-load-below-minimum" || w.code === "chip-load-band-impossible");
        if (r.maxChipThicknessMm < floor * (1 - 1e-9)) expect(said).toBe(true);
      }),
      RUNS,
    );
  });

  it("never lowers the plunge feed when the Z axis pushes harder", () => {
    fc.assert(
      fc.property(validInput, num(1, 20), (input, factor) => {
        const thrust = input.machine.zThrustN ?? 150;
        const weak = adaptRecipe({ ...input, machine: { ...input.machine, zThrustN: thrust } });
        const strong = adaptRecipe({ ...input, machine: { ...input.machine, zThrustN: thrust * factor } });
        if (weak.plungeFeedMmMin !== null) expect(strong.plungeFeedMmMin!).toBeGreaterThanOrEqual(weak.plungeFeedMmMin / TOL);
      }),
      RUNS,
    );
  });

  it("never raises the usable power at a lower spindle speed, nor with a higher rated speed", () => {
    fc.assert(
      fc.property(num(0.1, 20), num(1000, 30000), num(0.1, 1), num(1000, 30000), (power, rated, share, rpm) => {
        const at = (n: number, nRated: number) => spindlePowerAt({ ratedPowerKw: power, rpm: n, ratedRpm: nRated });
        expect(at(rpm * share, rated)).toBeLessThanOrEqual(at(rpm, rated) * TOL);
        expect(at(rpm, rated / share)).toBeLessThanOrEqual(at(rpm, rated) * TOL);
      }),
      RUNS,
    );
  });

  it("never cuts deeper with straight plunges only than with a ramp", () => {
    fc.assert(
      fc.property(validInput, (input) => {
        const straight = adaptRecipe({ ...input, entryCapability: "plunge-only" });
        const ramp = adaptRecipe({ ...input, entryCapability: "ramp" });
        expect(straight.axialDepthMm).toBeLessThanOrEqual(ramp.axialDepthMm * TOL);
      }),
      RUNS,
    );
  });
});
