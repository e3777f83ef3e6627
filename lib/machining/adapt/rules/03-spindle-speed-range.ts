import { change, type AdaptState } from "../state";

/** Rule 3: n = clamp(n_ref, n_min, n_max). */
export function spindleSpeedRange(s: AdaptState): void {
  const { minRpm, maxRpm } = s.input.machine;
  const n = s.input.operation.rpm;
  if (n > maxRpm) {
    change(s, "spindle-speed-range", "rpm", "spindleSpeed", maxRpm, "Your spindle cannot turn as fast as the vendor's test machine, so it runs at its top speed and the feed follows to keep the chip load.");
  } else if (n < minRpm) {
    change(s, "spindle-speed-range", "rpm", "spindleSpeed", minRpm, "Your spindle cannot turn as slowly as the vendor's test machine, so it runs at its lowest speed and the feed follows to keep the chip load.");
  }
}
