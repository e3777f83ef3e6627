import { positive } from "../validate";

// Drilling thrust approximation for κr = 90°, from memory: Ff ≈ 0.5·kc·fn·D/2.

/** Approximate axial thrust of a plunge in N. */
export function plungeThrust({ specificCuttingForceNmm2, feedPerRevMm, diameterMm }: { specificCuttingForceNmm2: number; feedPerRevMm: number; diameterMm: number }): number {
  return 0.5 * positive(specificCuttingForceNmm2, "specificCuttingForceNmm2") * positive(feedPerRevMm, "feedPerRevMm") * (positive(diameterMm, "diameterMm") / 2);
}

/** Feed per revolution fn whose thrust estimate equals the limit: fn = Ff / (0.5·kc·D/2). */
export function feedPerRevForThrust({ specificCuttingForceNmm2, thrustN, diameterMm }: { specificCuttingForceNmm2: number; thrustN: number; diameterMm: number }): number {
  return positive(thrustN, "thrustN") / (0.5 * positive(specificCuttingForceNmm2, "specificCuttingForceNmm2") * (positive(diameterMm, "diameterMm") / 2));
}
