import { MIN_RADIAL_ENGAGEMENT } from "../defaults";
import { say } from "../message-units";
import { effectiveDiameter, engagementAngleAt, hexFactor, kcAt, radialFactor, warn, type AdaptState } from "../state";

// δ = F·L³/(3·E·I), I = π·(0.8·D)⁴/64 (Gere & Goodno; 0.8·D a rule of thumb). L³ and 3·E·I are worked out
// once per call: the search below evaluates δ some 25 times.
const beamStiffness = (s: AdaptState) => {
  const de = 0.8 * s.input.operation.diameterMm;
  return 3 * s.input.youngsModulusGPa * 1000 * ((Math.PI * de ** 4) / 64);
};

/** F_peak = kc(hex)·ap·hex · ze · √(1 + Kr²), ze = max(1, z·φs/2π) (Altintas ch. 2); `hexPerFz` is hexFactor at ae. */
function peakForce(s: AdaptState, aeMm: number, chipLoadMm: number, hexPerFz: number, radialTerm: number): number {
  const flutes = s.input.operation.flutes;
  const hex = chipLoadMm * hexPerFz;
  const phi = engagementAngleAt(s, aeMm);
  const ze = Math.max(1, (flutes * phi) / (2 * Math.PI));
  return (kcAt(s, hex) ?? 0) * s.axialDepthMm * hex * ze * radialTerm;
}

/**
 * δ at radial depth ae, with hex held (rule 2) and the feed cap applied (rule 5); `deShare` is De/D at
 * the state's ap. A module function, not a closure in the search: one closure per call cost more than
 * the search itself.
 */
function deflectionAt(s: AdaptState, aeMm: number, deShare: number, stickoutCubed: number, stiffness: number, radialTerm: number): number {
  const { diameterMm: d, flutes } = s.input.operation;
  const hexPerFz = radialFactor(aeMm, d) * deShare;
  const fz = s.targetHexMm / hexPerFz;
  const vf = Math.min(fz * flutes * s.rpm, s.input.machine.maxFeedMmMin);
  return (peakForce(s, aeMm, vf / (flutes * s.rpm), hexPerFz, radialTerm) * stickoutCubed) / stiffness;
}

/** Largest ae ≥ 5 % of D whose deflection meets the limit (δ rises with ae), or null. */
function suggestRadialDepth(s: AdaptState, stickoutCubed: number, stiffness: number, radialTerm: number): number | null {
  const limit = s.input.deflectionLimitMm;
  const d = s.input.operation.diameterMm;
  // De/D at the state's ap: the same for every ae tried.
  const deShare = effectiveDiameter(s, s.axialDepthMm) / d;
  let lo = MIN_RADIAL_ENGAGEMENT * d;
  let hi = s.radialDepthMm;
  if (lo >= hi || deflectionAt(s, lo, deShare, stickoutCubed, stiffness, radialTerm) > limit) return null;
  for (let i = 0; i < 24; i++) {
    const mid = (lo + hi) / 2;
    if (deflectionAt(s, mid, deShare, stickoutCubed, stiffness, radialTerm) <= limit) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** Rule 10: δ from the peak force at the stick-out (never shorter than the flute length); warn above the limit with suggestions. */
export function toolDeflection(s: AdaptState): void {
  if (s.input.force === null) return;
  const kr = s.input.radialForceRatio;
  const radialTerm = Math.sqrt(1 + kr * kr);
  s.peakForceN = peakForce(s, s.radialDepthMm, s.chipLoadMm, hexFactor(s, s.radialDepthMm, s.axialDepthMm), radialTerm);
  const given = s.input.stickoutMm;
  if (given === undefined) {
    warn(
      s,
      "no-stickout",
      "No stick-out was given, so tool deflection was not checked. Enter how far the cutter sticks out of the collet.",
    );
    return;
  }
  const stickout = Math.max(given, s.input.operation.fluteLengthMm ?? 0);
  const stickoutCubed = stickout ** 3;
  const stiffness = beamStiffness(s);
  s.deflectionMm = (s.peakForceN * stickoutCubed) / stiffness;
  const limit = s.input.deflectionLimitMm;
  if (s.deflectionMm <= limit) return;
  const units = s.input.units;
  const ae = suggestRadialDepth(s, stickoutCubed, stiffness, radialTerm);
  const ratio = limit / s.deflectionMm;
  const shorter = stickout * Math.cbrt(ratio);
  const values = [
    { name: "deflectionMm", quantity: "deflection" as const, value: s.deflectionMm },
    { name: "deflectionLimitMm", quantity: "deflection" as const, value: limit },
    { name: "stickoutMm", quantity: "length" as const, value: shorter },
    { name: "axialDepthMm", quantity: "length" as const, value: s.axialDepthMm * ratio },
    ...(ae === null ? [] : [{ name: "radialDepthMm", quantity: "length" as const, value: ae }]),
  ];
  const advice =
    ae === null
      ? "Shorten the stick-out or cut shallower (see the suggested values); no radial depth the engine will adapt to is light enough at this stick-out."
      : "Reduce the radial depth, cut shallower or shorten the stick-out (see the suggested values).";
  warn(
    s,
    "deflection-above-limit",
    `The cutter will bend about ${say(units, s.deflectionMm, "deflection")} at its peak tooth force, more than the limit, which hurts accuracy and finish and can break the tool. ${advice}`,
    values,
  );
}
