import { positive, radialDepth } from "../validate";

// Milling geometry after Altintas, Manufacturing Automation, ch. 2.

interface Engagement {
  diameterMm: number;
  radialDepthMm: number;
}

const ratio = ({ diameterMm, radialDepthMm }: Engagement) => {
  const d = positive(diameterMm, "diameterMm");
  return radialDepth(radialDepthMm, d, "radialDepthMm") / d;
};

/** Radial engagement angle φ = arccos(1 − 2·ae/D), in radians (π for a full slot). */
export function engagementAngle(input: Engagement): number {
  return Math.acos(1 - 2 * ratio(input));
}

const thinningFromRatio = (r: number) => (r >= 0.5 ? 1 : 1 / (2 * Math.sqrt(r * (1 - r))));

/** Chip thinning factor CTF = fz / hex, 1 at ae ≥ D/2, growing as ae shrinks. */
export function chipThinningFactor(input: Engagement): number {
  return thinningFromRatio(ratio(input));
}

/** Maximum chip thickness hex = fz / CTF in mm. */
export function maxChipThickness(input: Engagement & { chipLoadMm: number }): number {
  return positive(input.chipLoadMm, "chipLoadMm") / chipThinningFactor(input);
}

/** Chip load that gives the target hex at this engagement: fz = hex · CTF(ae). */
export function chipLoadForThickness(input: Engagement & { maxChipThicknessMm: number }): number {
  return positive(input.maxChipThicknessMm, "maxChipThicknessMm") * chipThinningFactor(input);
}

/** Mean chip thickness hm = fz·(1 − cos φs)/φs = 2·fz·(ae/D)/φs (a slot: 2·fz/π), the integral of fz·sin φ over the arc. */
export function meanChipThickness(input: Engagement & { chipLoadMm: number }): number {
  const r = ratio(input);
  return (positive(input.chipLoadMm, "chipLoadMm") * 2 * r) / Math.acos(1 - 2 * r);
}
