import { fraction, positive } from "../validate";

// Cantilever with an end load, δ = F·L³/(3·E·I) (Gere & Goodno, Mechanics of Materials).
// The fluted part is modelled as a round bar of 0.8·D: a rule of thumb, from memory.

export interface DeflectionInput {
  forceN: number;
  stickoutMm: number;
  diameterMm: number;
  youngsModulusGPa: number;
  effectiveDiameterRatio?: number;
}

/** Second moment of area of a round bar, I = π·d⁴/64 in mm⁴. */
export const roundBarInertia = (diameterMm: number) => (Math.PI * positive(diameterMm, "diameterMm") ** 4) / 64;

/** Tool tip deflection δ in mm. */
export function toolDeflection(input: DeflectionInput): number {
  const f = positive(input.forceN, "forceN");
  const l = positive(input.stickoutMm, "stickoutMm");
  const e = positive(input.youngsModulusGPa, "youngsModulusGPa") * 1000; // N/mm²
  const ratio = fraction(input.effectiveDiameterRatio ?? 0.8, "effectiveDiameterRatio");
  return (f * l ** 3) / (3 * e * roundBarInertia(positive(input.diameterMm, "diameterMm") * ratio));
}

/** Stick-out at which the tip deflects by δ: L = ∛(3·E·I·δ / F). */
export function stickoutForDeflection(input: Omit<DeflectionInput, "stickoutMm"> & { deflectionMm: number }): number {
  const e = positive(input.youngsModulusGPa, "youngsModulusGPa") * 1000;
  const ratio = fraction(input.effectiveDiameterRatio ?? 0.8, "effectiveDiameterRatio");
  const i = roundBarInertia(positive(input.diameterMm, "diameterMm") * ratio);
  return Math.cbrt((3 * e * i * positive(input.deflectionMm, "deflectionMm")) / positive(input.forceN, "forceN"));
}
