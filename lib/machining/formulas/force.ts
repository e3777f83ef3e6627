import { count, nonNegative, positive, radialDepth } from "../validate";

// Kienzle, O. (1952): kc(h) = kc1.1 · h^(−mc), h in mm. Peak tooth force after Altintas,
// Manufacturing Automation, ch. 2: the tangential force on one tooth at the thickest chip, times
// the teeth in the cut at once, with the radial component Kr·Ft added as a vector.

/** Default Kienzle exponent when only kc1.1 is known: typical of metals and plastics, from memory. */
export const DEFAULT_KIENZLE_MC = 0.25;
/** Radial to tangential force ratio Kr, from memory. */
export const DEFAULT_RADIAL_FORCE_RATIO = 0.3;

/** kc(h) = kc1.1·h^(−mc) in N/mm²; with mc = 0 a constant kc. */
export function kienzleKc({ kc11Nmm2, mc, chipThicknessMm }: { kc11Nmm2: number; mc: number; chipThicknessMm: number }): number {
  return positive(kc11Nmm2, "kc11Nmm2") * positive(chipThicknessMm, "chipThicknessMm") ** -nonNegative(mc, "mc");
}

export interface PeakForceInput {
  diameterMm: number;
  radialDepthMm: number;
  axialDepthMm: number;
  chipLoadMm: number;
  flutes: number;
  /** kc1.1 with `mc`, or a constant kc with mc = 0 (the default). */
  kc11Nmm2: number;
  mc?: number;
  radialForceRatio?: number;
}

/** Teeth in the cut at once, ze = max(1, z·φs/2π). */
export const teethInCut = (flutes: number, engagementAngleRad: number) => Math.max(1, (flutes * engagementAngleRad) / (2 * Math.PI));

/** F_peak = kc(hex)·ap·hex · ze · √(1 + Kr²) in N. */
export function peakToothForce(input: PeakForceInput): number {
  const d = positive(input.diameterMm, "diameterMm");
  const r = radialDepth(input.radialDepthMm, d, "radialDepthMm") / d;
  const fz = positive(input.chipLoadMm, "chipLoadMm");
  const phi = Math.acos(1 - 2 * r);
  const hex = r >= 0.5 ? fz : fz * Math.sin(phi);
  const kc = kienzleKc({ kc11Nmm2: input.kc11Nmm2, mc: input.mc ?? 0, chipThicknessMm: hex });
  const kr = nonNegative(input.radialForceRatio ?? DEFAULT_RADIAL_FORCE_RATIO, "radialForceRatio");
  return kc * positive(input.axialDepthMm, "axialDepthMm") * hex * teethInCut(count(input.flutes, "flutes"), phi) * Math.sqrt(1 + kr * kr);
}
