import { describe, expect, it } from "vitest";

import { chipLoadBand, chipThinningFactor, plungeFeedPerRevForThrust, plungeThrustN, SLOTTING_FACTOR } from "@/lib/machining";
import { chipTargets, deriveOperation } from "@/lib/sheets/derive-starting-data";

// Starting numbers derived by the engine's own rules (lib/sheets/derive-starting-data.ts).
const cutter = { diameterMm: 6, flutes: 2, cornerForm: "square", fluteLengthMm: 18 };
const wood = { materialGroup: "wood", vcMinMpm: 300, vcMaxMpm: 600, minChipLoadMm: 0.05, kcNmm2: 90 };
const rigid = { rpmMin: 6000, rpmMax: 24000, maxFeedMmMin: 15000, rigidity: 1, zThrustN: 1500 };
const acrylic = { materialGroup: "plastics", vcMinMpm: 150, vcMaxMpm: 300, minChipLoadMm: 0.05, kcNmm2: 120 };
const light = { rpmMin: 8000, rpmMax: 24000, maxFeedMmMin: 5000, rigidity: 0.4, zThrustN: 150 };

describe("deriveOperation", () => {
  it("takes n from the middle of the vc window (n = 1000·vc/(π·D), ISO 3002-1) and vf = fz·z·n", () => {
    const op = deriveOperation({ cutter, material: wood, machine: rigid, kind: "pocket" });
    // n = 1000·450/(π·6) = 23873 rpm → 23900 rpm.
    expect(op.n).toBe("23900 rpm");
    expect(op.derived.feedMmMin).toBeCloseTo(op.derived.fzMm * 2 * 23900, 6);
  });

  it("holds the chip the edge sees inside the band with margins; a light pass is fed up by chip thinning (Altintas ch. 2)", () => {
    const band = chipLoadBand({ minChipLoadMm: 0.05, chipLoadPctOfD: { min: 0.012, max: 0.03 } }, 6);
    const pocket = deriveOperation({ cutter, material: wood, machine: rigid, kind: "pocket" });
    const finish = deriveOperation({ cutter, material: wood, machine: rigid, kind: "finishing" });
    for (const op of [pocket, finish]) {
      expect(op.derived.hexMm).toBeGreaterThanOrEqual(band.minMm * 1.05);
      expect(op.derived.hexMm).toBeLessThanOrEqual(band.maxMm * 0.95);
    }
    // ae = 0.3 mm of 6 mm: CTF = 1/(2·√(0.05·0.95)) ≈ 2.29, so fz ≈ 2.29·hex.
    expect(finish.derived.fzMm / finish.derived.hexMm).toBeCloseTo(chipThinningFactor({ diameterMm: 6, radialDepthMm: 0.3 }), 6);
  });

  it("runs a full-width slot at the slotting factor of the pocketing chip (common practice: 70–80 % of the pocket feed)", () => {
    const pocket = deriveOperation({ cutter, material: wood, machine: rigid, kind: "pocket" });
    const slot = deriveOperation({ cutter, material: wood, machine: rigid, kind: "slotting" });
    expect(slot.derived.hexMm / pocket.derived.hexMm).toBeCloseTo(SLOTTING_FACTOR, 2);
  });

  it("keeps vf within 80 % of the machine's max feed, lowering n first (not under the vc window)", () => {
    const op = deriveOperation({ cutter, material: wood, machine: { ...rigid, maxFeedMmMin: 3000 }, kind: "profile" });
    expect(op.derived.feedMmMin).toBeLessThanOrEqual(2400);
    expect(op.derived.vcMpm).toBeGreaterThanOrEqual(300);
    expect(op.derived.rpm).toBeLessThan(23900);
  });

  it("plunges by fn from the thrust model on the machine's Z (calibrated thrust model), never at a third of the feed", () => {
    const quarter = { diameterMm: 6.35, flutes: 1, cornerForm: "square", fluteLengthMm: 19 };
    const op = deriveOperation({ cutter: quarter, material: acrylic, machine: light, kind: "pocket" });
    const fn = op.derived.plungeFeedMmMin! / op.derived.rpm;
    expect(fn).toBeLessThanOrEqual(plungeFeedPerRevForThrust({ diameterMm: 6.35, kcNmm2: 120, zThrustN: 0.8 * 150 })! + 1e-9);
    expect(plungeThrustN({ diameterMm: 6.35, kcNmm2: 120, feedPerRevMm: fn })).toBeLessThanOrEqual(150);
    expect(Math.abs(op.derived.plungeFeedMmMin! - op.derived.feedMmMin / 3)).toBeGreaterThan(10);
  });

  it("enters by ramp, with no plunge feed, where even the cutter's centre needs more thrust than the Z has", () => {
    const aluminium = {
      materialGroup: "non-ferrous",
      vcMinMpm: 150,
      vcMaxMpm: 400,
      minChipLoadMm: 0.02,
      kcNmm2: 700,
      kc11Nmm2: 500,
      mc: 0.25,
    };
    const op = deriveOperation({ cutter: { ...cutter, flutes: 3 }, material: aluminium, machine: light, kind: "pocket" });
    // Centre term B·kc·D² = 0.012·500·36 = 216 N > 0.8·150 N.
    expect(op.plungeFeed).toBeUndefined();
    expect(op.entry).toBe("ramp");
  });

  it("never gives a 1/32 in cutter a chip above the band's ceiling in acrylic (it would snap)", () => {
    const tiny = { diameterMm: 0.79375, flutes: 2, cornerForm: "square", fluteLengthMm: 2.4 };
    const targets = chipTargets(acrylic, 0.79375);
    expect(targets.band.impossible).toBe(true);
    for (const kind of ["slotting", "profile"] as const) {
      const op = deriveOperation({ cutter: tiny, material: acrylic, machine: light, kind });
      // Ceiling 3 % of D = 0.0238 mm; the old template gave 0.055 mm per tooth.
      expect(op.derived.hexMm).toBeLessThanOrEqual(0.03 * 0.79375);
      expect(op.derived.fzMm).toBeLessThan(0.055);
    }
  });
});
