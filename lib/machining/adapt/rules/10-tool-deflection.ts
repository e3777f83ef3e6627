import { MIN_RADIAL_ENGAGEMENT } from "../defaults";
import { say } from "../message-units";
import { hexFactor, kcAt, warn, type AdaptState } from "../state";

// δ = F·L³/(3·E·I), I = π·(0.8·D)⁴/64 (Gere & Goodno; 0.8·D a rule of thumb).
const deflection = (s: AdaptState, forceN: number, stickoutMm: number) => {
  const de = 0.8 * s.input.operation.diameterMm;
  return (forceN * stickoutMm ** 3) / (3 * s.input.youngsModulusGPa * 1000 * ((Math.PI * de ** 4) / 64));
};

/** F_peak = kc(hex)·ap·hex · ze · √(1 + Kr²), ze = max(1, z·φs/2π) (Altintas ch. 2). */
function peakForce(s: AdaptState, aeMm: number, chipLoadMm: number): number {
  const { diameterMm, flutes } = s.input.operation;
  const hex = chipLoadMm * hexFactor(s, aeMm, s.axialDepthMm);
  const phi = Math.acos(1 - 2 * Math.min(1, aeMm / diameterMm));
  const ze = Math.max(1, (flutes * phi) / (2 * Math.PI));
  const kr = s.input.radialForceRatio;
  return (kcAt(s, hex) ?? 0) * s.axialDepthMm * hex * ze * Math.sqrt(1 + kr * kr);
}

/** Peak force at radial depth ae with hex held (rule 2) and the feed cap applied (rule 5). */
const peakForceAt = (s: AdaptState, aeMm: number) => {
  const { flutes } = s.input.operation;
  const fz = s.targetHexMm / hexFactor(s, aeMm, s.axialDepthMm);
  const vf = Math.min(fz * flutes * s.rpm, s.input.machine.maxFeedMmMin);
  return peakForce(s, aeMm, vf / (flutes * s.rpm));
};

/** Largest ae ≥ 5 % of D whose deflection meets the limit (δ rises with ae), or null. */
function suggestRadialDepth(s: AdaptState, stickoutMm: number): number | null {
  const limit = s.input.deflectionLimitMm;
  let lo = MIN_RADIAL_ENGAGEMENT * s.input.operation.diameterMm;
  let hi = s.radialDepthMm;
  if (lo >= hi || deflection(s, peakForceAt(s, lo), stickoutMm) > limit) return null;
  for (let i = 0; i < 32; i++) {
    const mid = (lo + hi) / 2;
    if (deflection(s, peakForceAt(s, mid), stickoutMm) <= limit) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** Rule 10: δ from the peak force at the stick-out (never shorter than the flute length); warn above the limit with suggestions. */
export function toolDeflection(s: AdaptState): void {
  if (s.input.force === null) return;
  s.peakForceN = peakForce(s, s.radialDepthMm, s.chipLoadMm);
  const given = s.input.stickoutMm;
  if (given === undefined) {
    warn(s, "no-stickout", "No stick-out was given, so tool deflection was not checked. Enter how far the cutter sticks out of the collet.");
    return;
  }
  const stickout = Math.max(given, s.input.operation.fluteLengthMm ?? 0);
  s.deflectionMm = deflection(s, s.peakForceN, stickout);
  const limit = s.input.deflectionLimitMm;
  if (s.deflectionMm <= limit) return;
  const units = s.input.units;
  const ae = suggestRadialDepth(s, stickout);
  const ratio = limit / s.deflectionMm;
  const shorter = stickout * Math.cbrt(ratio);
  const values = [
    { name: "deflectionMm", quantity: "deflection" as const, value: s.deflectionMm },
    { name: "deflectionLimitMm", quantity: "deflection" as const, value: limit },
    { name: "stickoutMm", quantity: "length" as const, value: shorter },
    { name: "axialDepthMm", quantity: "length" as const, value: s.axialDepthMm * ratio },
    ...(ae === null ? [] : [{ name: "radialDepthMm", quantity: "length" as const, value: ae }]),
  ];
  const advice = ae === null
    ? "Shorten the stick-out or cut shallower (see the suggested values); no radial depth the engine will adapt to is light enough at this stick-out."
    : "Reduce the radial depth, cut shallower or shorten the stick-out (see the suggested values).";
  warn(s, "deflection-above-limit", `The cutter will bend about ${say(units, s.deflectionMm, "deflection")} at its peak tooth force, more than the limit, which hurts accuracy and finish and can break the tool. ${advice}`, values);
}
