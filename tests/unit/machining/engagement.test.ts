import { describe, expect, it } from "vitest";

import { chipLoadForThickness, chipThinningFactor, engagementAngle, MachiningInputError, maxChipThickness } from "@/lib/machining";

// Milling geometry (Altintas, Manufacturing Automation, ch. 2): φ = arccos(1 − 2·ae/D),
// hex = fz·sin φ for ae < D/2, hex = fz from ae = D/2 on.
describe("radial engagement and chip thinning", () => {
  it("engagement angle is 60° at ae = D/4, 90° at D/2 and 180° in a slot", () => {
    // arccos(1 − 2 × 0.25) = arccos(0.5) = π/3
    expect(engagementAngle({ diameterMm: 12, radialDepthMm: 3 })).toBeCloseTo(Math.PI / 3, 12);
    expect(engagementAngle({ diameterMm: 12, radialDepthMm: 6 })).toBeCloseTo(Math.PI / 2, 12);
    expect(engagementAngle({ diameterMm: 12, radialDepthMm: 12 })).toBeCloseTo(Math.PI, 12);
  });

  it("hex = fz·sin 60° at ae = D/4", () => {
    // 0.1 × sin(60°) = 0.1 × 0.866025 = 0.0866025 mm
    expect(maxChipThickness({ diameterMm: 12, radialDepthMm: 3, chipLoadMm: 0.1 })).toBeCloseTo(0.0866025, 7);
  });

  it("CTF = 1/(2·√(r(1 − r))) = 1.6667 at ae = 10 % of D", () => {
    // 2 × √(0.1 × 0.9) = 2 × 0.3 = 0.6, so CTF = 1/0.6 = 1.6667
    expect(chipThinningFactor({ diameterMm: 10, radialDepthMm: 1 })).toBeCloseTo(1 / 0.6, 12);
  });

  it("CTF is 1 from half the diameter to a full slot", () => {
    expect(chipThinningFactor({ diameterMm: 10, radialDepthMm: 5 })).toBe(1);
    expect(chipThinningFactor({ diameterMm: 10, radialDepthMm: 10 })).toBe(1);
  });

  it("holding hex at a smaller ae raises fz by CTF", () => {
    // hex 0.05 at ae = 0.1·D: fz = 0.05 × 1.6667 = 0.08333 mm
    expect(chipLoadForThickness({ diameterMm: 10, radialDepthMm: 1, maxChipThicknessMm: 0.05 })).toBeCloseTo(0.083333, 6);
  });

  it("refuses ae above the diameter, naming the field", () => {
    expect(() => chipThinningFactor({ diameterMm: 6, radialDepthMm: 6.5 })).toThrowError(
      expect.objectContaining({ field: "radialDepthMm" }),
    );
    expect(() => chipThinningFactor({ diameterMm: 6, radialDepthMm: 0 })).toThrowError(MachiningInputError);
  });
});
