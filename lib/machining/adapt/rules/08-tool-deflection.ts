import { MIN_RADIAL_ENGAGEMENT } from "../defaults";
import { warn, type AdaptState } from "../state";

// δ = F·L³/(3·E·I), I = π·(0.8·D)⁴/64.
const deflection = (s: AdaptState, forceN: number, stickoutMm: number) => {
  const de = 0.8 * s.input.operation.diameterMm;
  return (forceN * stickoutMm ** 3) / (3 * s.input.youngsModulusGPa * 1000 * ((Math.PI * de ** 4) / 64));
};

/** Force at radial depth ae when hex is held (rule 2) and the feed cap applies (rule 4). */
const forceAt = (s: AdaptState, ae: number, kc: number) => {
  const { diameterMm, flutes } = s.input.operation;
  const r = ae / diameterMm;
  const fz = r >= 0.5 ? s.targetHexMm : s.targetHexMm / (2 * Math.sqrt(r * (1 - r)));
  const vf = Math.min(fz * flutes * s.rpm, s.input.machine.maxFeedMmMin);
  return (s.axialDepthMm * ae * vf * kc) / (1000 * s.cuttingSpeedMpm);
};

/** Largest ae ≥ 5 % of D whose deflection meets the limit (δ rises with ae), or null. */
function suggestRadialDepth(s: AdaptState, kc: number, stickoutMm: number): number | null {
  const limit = s.input.deflectionLimitMm;
  let lo = MIN_RADIAL_ENGAGEMENT * s.input.operation.diameterMm;
  let hi = s.radialDepthMm;
  if (lo >= hi || deflection(s, forceAt(s, lo, kc), stickoutMm) > limit) return null;
  for (let i = 0; i < 32; i++) {
    const mid = (lo + hi) / 2;
    if (deflection(s, forceAt(s, mid, kc), stickoutMm) <= limit) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** Rule 8: δ at the customer's stick-out; warn above the limit and suggest the ae that meets it. */
export function toolDeflection(s: AdaptState): void {
  const kc = s.input.material.specificCuttingForceNmm2;
  const stickout = s.input.stickoutMm;
  if (kc === undefined || s.forceN === null) return;
  if (stickout === undefined) {
    warn(s, "no-stickout", "No stick-out was given, so tool deflection was not checked. Enter how far the cutter sticks out of the collet.");
    return;
  }
  s.deflectionMm = deflection(s, s.forceN, stickout);
  const limit = s.input.deflectionLimitMm;
  if (s.deflectionMm <= limit) return;
  const ae = suggestRadialDepth(s, kc, stickout);
  const shorter = Math.cbrt((limit * stickout ** 3) / s.deflectionMm);
  const values = [
    { name: "deflectionMm", quantity: "deflection" as const, value: s.deflectionMm },
    { name: "deflectionLimitMm", quantity: "deflection" as const, value: limit },
    { name: "stickoutMm", quantity: "length" as const, value: shorter },
    ...(ae === null ? [] : [{ name: "radialDepthMm", quantity: "length" as const, value: ae }]),
  ];
  const advice = ae === null
    ? "Shorten the stick-out; no radial depth the engine will adapt to is light enough at this stick-out."
    : "Reduce the radial depth to the suggested value or shorten the stick-out.";
  warn(s, "deflection-above-limit", `The cutter will bend more than the limit at this stick-out, which hurts accuracy and finish and can break the tool. ${advice}`, values);
}
