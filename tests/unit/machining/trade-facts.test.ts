import { unit } from "mathjs";
import { describe, expect, it } from "vitest";

import {
  adaptRecipe,
  cuttingSpeed,
  feedRate,
  inToMm,
  mmMinToInMin,
  mpmToSfm,
  PLUNGE_THRUST_A,
  PLUNGE_THRUST_B,
  plungeFeed,
  plungeFeedPerRevForThrust,
  plungeThrustN,
  sfmToMpm,
  spindleSpeed,
  type AdaptInput,
} from "@/lib/machining";

import { baseInput, withPatch } from "./fixtures";

// Facts of the trade (lib/machining/README.md, "Check values"): common practice, no single source.
// Cast acrylic's kc = 120 N/mm² is a value from memory for the calibration, not a published figure.
const ACRYLIC_KC = 120;
const QUARTER_INCH = inToMm(0.25);
const SIXTEENTH_INCH = inToMm(1 / 16);

/** A sheet tested on a rigid machine plunging at 30 in/min, adapted to a light belt-drive router (Z thrust unknown: 150 N). */
const acrylicOnLightRouter = (entryCapability: AdaptInput["entryCapability"]): AdaptInput => ({
  operation: {
    kind: "pocket",
    diameterMm: QUARTER_INCH,
    flutes: 2,
    rpm: 10000,
    feedMmMin: inToMm(60),
    axialDepthMm: 3,
    radialDepthMm: 3,
    plungeFeedMmMin: inToMm(30),
    stickoutMm: 20,
    fluteLengthMm: 19,
  },
  material: { cuttingSpeedWindowMpm: [120, 300], specificCuttingForceNmm2: ACRYLIC_KC, minChipLoadMm: 0.05, meltsWhenRubbing: true },
  referenceMachine: { rigidity: 1, rigidityClass: "rigid", zThrustN: 1500 },
  machine: { minRpm: 10000, maxRpm: 10000, maxFeedMmMin: 5000, spindlePowerKw: 0.8, rigidity: 0.35 },
  entryCapability,
});

describe("facts of the trade (common practice)", () => {
  it("a 1/4 in cutter at 10 000 rpm runs at about 654 SFM, about 199.5 m/min (ISO 3002-1 definition of vc)", () => {
    const vc = cuttingSpeed({ diameterMm: QUARTER_INCH, rpm: 10000 });
    expect(vc).toBeCloseTo(199.5, 1);
    expect(mpmToSfm(vc)).toBeCloseTo(654.5, 1);
    expect(unit(vc, "m/min").toNumber("ft/min")).toBeCloseTo(mpmToSfm(vc), 9); // cross-checked against mathjs
  });

  it("cast acrylic at about 600 SFM with a 1/4 in carbide cutter is about 9 200 rpm", () => {
    // 12 × 600 / (π × 0.25) = 9167 rpm
    expect(spindleSpeed({ diameterMm: QUARTER_INCH, cuttingSpeedMpm: sfmToMpm(600) })).toBeCloseTo(9167, 0);
  });

  it("a plunge at 0.001 in per revolution at 10 000 rpm is a 10 in/min plunge feed", () => {
    expect(mmMinToInMin(plungeFeed({ feedPerRevMm: inToMm(0.001), rpm: 10000 }))).toBeCloseTo(10, 10);
    expect(unit(plungeFeed({ feedPerRevMm: inToMm(0.001), rpm: 10000 }), "mm/min").toNumber("in/min")).toBeCloseTo(10, 10);
  });

  it("calibration: A = 2.1 and B = 0.012 are calibrated so a 1/4 in cutter in acrylic on a 150 N Z axis plunges at about 11 in/min", () => {
    // Calibrated, not published: with kc = 120 N/mm² the centre term is 0.012 × 120 × 6.35² = 58.1 N and the lip
    // term takes the remaining 91.9 N at fn = (91.9 / (2.1 × 120 × 6.35))^(1/0.8) = 0.0281 mm/rev ≈ 0.0011 in/rev.
    expect([PLUNGE_THRUST_A, PLUNGE_THRUST_B]).toEqual([2.1, 0.012]);
    const fn = plungeFeedPerRevForThrust({ diameterMm: QUARTER_INCH, kcNmm2: ACRYLIC_KC, zThrustN: 150 })!;
    expect(fn).toBeCloseTo(0.0281, 4);
    const inMin = mmMinToInMin(plungeFeed({ feedPerRevMm: fn, rpm: 10000 }));
    expect(inMin).toBeGreaterThanOrEqual(10);
    expect(inMin).toBeLessThanOrEqual(12);
    expect(plungeThrustN({ diameterMm: QUARTER_INCH, kcNmm2: ACRYLIC_KC, feedPerRevMm: fn })).toBeCloseTo(150, 9);
  });

  it("on a light router (Z thrust about 150 N) a 1/4 in cutter in acrylic plunges at 10–12 in/min, with the reason and a ramp suggestion", () => {
    const r = adaptRecipe(acrylicOnLightRouter("plunge-only"));
    const inMin = mmMinToInMin(r.plungeFeedMmMin!);
    expect(inMin).toBeGreaterThanOrEqual(10);
    expect(inMin).toBeLessThanOrEqual(12);
    expect(r.warnings.map((w) => w.code)).toEqual(expect.arrayContaining(["plunge-thrust-limited", "ramp-entry-recommended"]));
    expect(r.steps.find((s) => s.rule === "plunge-feed" && s.field === "plungeFeedMmMin")?.why).toMatch(/Z axis/);
  });

  it("a 1/16 in cutter plunges several times faster than a 1/4 in cutter on the same Z axis (pressure is force over area)", () => {
    const at = (d: number) => plungeFeedPerRevForThrust({ diameterMm: d, kcNmm2: ACRYLIC_KC, zThrustN: 150 })!;
    expect(at(SIXTEENTH_INCH) / at(QUARTER_INCH)).toBeGreaterThan(3);
  });

  it("a larger cutter needs more axial force to plunge at the same feed per revolution", () => {
    const at = (diameterMm: number) => plungeThrustN({ kcNmm2: 800, feedPerRevMm: 0.03, diameterMm });
    expect(at(12)).toBeGreaterThan(at(6));
  });

  it("full-width slotting runs at 70–80 % of the pocketing feed at the same speed, with a shallower depth", () => {
    const pocket = withPatch({ operation: { kind: "pocket", radialDepthMm: 3 } });
    const asPocket = adaptRecipe(pocket);
    const asSlot = adaptRecipe({ ...pocket, overrides: { radialDepthMm: 6 } });
    expect(asSlot.rpm).toBe(asPocket.rpm);
    expect(asSlot.feedMmMin / asPocket.feedMmMin).toBeGreaterThanOrEqual(0.7);
    expect(asSlot.feedMmMin / asPocket.feedMmMin).toBeLessThanOrEqual(0.8);
    expect(asSlot.axialDepthMm).toBeLessThan(asPocket.axialDepthMm);
  });

  it("ramped or helical entry allows deeper cuts than a straight plunge; straight plunges in hard plastics start under D/4", () => {
    // on a machine as rigid as the sheet's, so that only the entry decides the depth
    const asRigid = (entry: AdaptInput["entryCapability"]) => {
      const input = acrylicOnLightRouter(entry);
      return adaptRecipe({ ...input, machine: { ...input.machine, rigidity: 1 } });
    };
    const straight = asRigid("plunge-only");
    const ramped = asRigid("ramp");
    expect(straight.axialDepthMm).toBeLessThanOrEqual(QUARTER_INCH / 4);
    expect(ramped.axialDepthMm).toBeGreaterThan(straight.axialDepthMm);
  });

  it("below the minimum chip load the engine warns that the cutter rubs", () => {
    const input = baseInput();
    const result = adaptRecipe({ ...input, material: { ...input.material, minChipLoadMm: 0.08 } });
    expect(result.warnings.map((w) => w.code)).toContain("chip-load-below-minimum");
    expect(result.warnings.find((w) => w.code === "chip-load-below-minimum")?.message).toMatch(/rub/);
  });

  it("light-router starting points in cast acrylic at 18 000 rpm: 0.002 in/tooth on two flutes is 72 in/min", () => {
    expect(mmMinToInMin(feedRate({ chipLoadMm: inToMm(0.002), flutes: 2, rpm: 18000 }))).toBeCloseTo(72, 9);
    // the same 72 in/min on a 1/8 in two-flute cutter is the same 0.002 in/tooth (cross-checked against mathjs)
    expect(unit(72, "in/min").toNumber("mm/min") / (2 * 18000)).toBeCloseTo(inToMm(0.002), 12);
  });

  it("a large cutter is steered to a ramp or helical entry", () => {
    const input = baseInput();
    const big = adaptRecipe({ ...input, operation: { ...input.operation, diameterMm: 16, radialDepthMm: 16 } });
    expect(big.warnings.map((w) => w.code)).toContain("ramp-entry-recommended");
  });
});
