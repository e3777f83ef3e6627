import { record, warn, type AdaptState } from "../state";

const RAMPED = new Set(["ramp", "helical", "drilling"]);

/** Rule 9: hold fn so vf_plunge = fn·n; cap by the Z thrust estimate and the max feed; ramp for large cutters. */
export function plungeFeed(s: AdaptState): void {
  const { diameterMm, plungeFeedMmMin, rpm: refRpm, kind } = s.input.operation;
  const { zThrustN, maxFeedMmMin } = s.input.machine;
  const kc = s.input.material.specificCuttingForceNmm2;
  if (diameterMm >= s.input.rampThresholdDiameterMm && !RAMPED.has(kind)) {
    warn(s, "ramp-entry-recommended", "For a cutter this size, enter with a ramp or a helix rather than a straight plunge: a large cutter needs a lot of axial force to plunge, and a ramp allows deeper cuts.");
  }
  if (plungeFeedMmMin === undefined) return;
  let fn = plungeFeedMmMin / refRpm;
  let feed = fn * s.rpm;
  s.plungeFeedMmMin = plungeFeedMmMin;
  record(s, "plunge-feed", "plungeFeedMmMin", "feedRate", plungeFeedMmMin, feed, "The plunge keeps the vendor's feed per revolution, so the plunge feed follows the spindle speed.");
  if (kc !== undefined && zThrustN !== undefined) {
    const thrustLimitedFn = zThrustN / (0.5 * kc * (diameterMm / 2));
    if (fn > thrustLimitedFn) {
      fn = thrustLimitedFn;
      record(s, "plunge-feed", "plungeFeedMmMin", "feedRate", feed, fn * s.rpm, "Pushing the cutter straight down at this feed would take more force than your Z axis can give, so the plunge feed is lowered.");
      feed = fn * s.rpm;
      warn(s, "plunge-thrust-limited", "The plunge feed is held down by your Z axis thrust limit.");
    }
  }
  if (feed > maxFeedMmMin) {
    record(s, "plunge-feed", "plungeFeedMmMin", "feedRate", feed, maxFeedMmMin, "This plunge feed is faster than your machine can move, so it is held at the machine's maximum.");
    feed = maxFeedMmMin;
  }
  s.plungeFeedMmMin = feed;
}
