import { fraction, positive } from "../validate";

// Machinery's Handbook, power section (unit power form); ISO 3002 quantities.

interface Cut {
  axialDepthMm: number;
  radialDepthMm: number;
  feedMmMin: number;
}

/** Material removal rate Q = ap·ae·vf / 1000 in cm³/min. */
export function materialRemovalRate({ axialDepthMm, radialDepthMm, feedMmMin }: Cut): number {
  return (positive(axialDepthMm, "axialDepthMm") * positive(radialDepthMm, "radialDepthMm") * positive(feedMmMin, "feedMmMin")) / 1000;
}

/** Power Pc = ap·ae·vf·kc / (60·10⁶·η) in kW; with η < 1 this is what the spindle must deliver. */
export function cuttingPower(input: Cut & { specificCuttingForceNmm2: number; efficiency?: number }): number {
  const kc = positive(input.specificCuttingForceNmm2, "specificCuttingForceNmm2");
  const eta = fraction(input.efficiency ?? 1, "efficiency");
  return (materialRemovalRate(input) * 1000 * kc) / (60e6 * eta);
}

/** Kienzle (1952): kc = kc1.1 · h^(−mc), with h in mm and kc1.1 in N/mm² at h = 1 mm. */
export function kienzleSpecificCuttingForce({
  kc11Nmm2,
  chipThicknessMm,
  mc,
}: {
  kc11Nmm2: number;
  chipThicknessMm: number;
  mc: number;
}): number {
  return positive(kc11Nmm2, "kc11Nmm2") * positive(chipThicknessMm, "chipThicknessMm") ** -fraction(mc, "mc");
}

// M = P/ω: 60 000/(2π) ≈ 9549.
const NM_PER_KW_RPM = 60000 / (2 * Math.PI);

/** Spindle torque M = 9549·P / n in N·m. */
export function spindleTorque({ powerKw, rpm }: { powerKw: number; rpm: number }): number {
  return (NM_PER_KW_RPM * positive(powerKw, "powerKw")) / positive(rpm, "rpm");
}

/** Tangential cutting force Fc = 60 000·Pc / vc in N (P = F·v). */
export function tangentialForce({ powerKw, cuttingSpeedMpm }: { powerKw: number; cuttingSpeedMpm: number }): number {
  return (60000 * positive(powerKw, "powerKw")) / positive(cuttingSpeedMpm, "cuttingSpeedMpm");
}
