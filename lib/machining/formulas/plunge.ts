import { positive } from "../validate";

// Plunge thrust Ff = A·kc·D·fn^0.8 + B·kc·D² (N; D mm, fn mm/rev, kc N/mm²). The form follows
// Machinery's Handbook's drilling-thrust formula: a lip term that grows with feed and a centre
// (web) term that grows with the cutter's area and does not fall with feed. A and B are not
// published: they are calibrated here to two facts of the trade (lib/machining/README.md, "Calibration").

/** Lip-term coefficient A (calibrated). */
export const PLUNGE_THRUST_A = 2.1;
/** Centre-term coefficient B (calibrated). */
export const PLUNGE_THRUST_B = 0.012;
/** Exponent of fn in the lip term: the thin-chip rise of kc is folded into it. */
export const PLUNGE_FEED_EXPONENT = 0.8;

/** The centre term B·kc·D², which a straight plunge needs at any feed. */
export const plungeCentreThrustN = (diameterMm: number, kcNmm2: number) => PLUNGE_THRUST_B * kcNmm2 * diameterMm * diameterMm;

/** Axial thrust of a straight plunge in N. */
export function plungeThrustN({ diameterMm, kcNmm2, feedPerRevMm }: { diameterMm: number; kcNmm2: number; feedPerRevMm: number }): number {
  const d = positive(diameterMm, "diameterMm");
  const kc = positive(kcNmm2, "kcNmm2");
  const fn = positive(feedPerRevMm, "feedPerRevMm");
  return PLUNGE_THRUST_A * kc * d * fn ** PLUNGE_FEED_EXPONENT + plungeCentreThrustN(d, kc);
}

/** fn (mm/rev) whose thrust equals zThrustN; null when the centre term alone exceeds it. */
export function plungeFeedPerRevForThrust({
  diameterMm,
  kcNmm2,
  zThrustN,
}: {
  diameterMm: number;
  kcNmm2: number;
  zThrustN: number;
}): number | null {
  const d = positive(diameterMm, "diameterMm");
  const kc = positive(kcNmm2, "kcNmm2");
  const lip = positive(zThrustN, "zThrustN") - plungeCentreThrustN(d, kc);
  if (lip <= 0) return null;
  return (lip / (PLUNGE_THRUST_A * kc * d)) ** (1 / PLUNGE_FEED_EXPONENT);
}
