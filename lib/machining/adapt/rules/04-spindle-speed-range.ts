import { change, effectiveDiameter, type AdaptState } from "../state";

/** Rule 4: n = clamp(n_ref, n_min, n_max); a ball nose is judged at De and sped up toward the window, within n_max. */
export function spindleSpeedRange(s: AdaptState): void {
  const { minRpm, maxRpm } = s.input.machine;
  const n = s.input.operation.rpm;
  if (n > maxRpm) {
    change(
      s,
      "spindle-speed-range",
      "rpm",
      "spindleSpeed",
      maxRpm,
      "Your spindle cannot turn as fast as the vendor's test machine, so it runs at its top speed and the feed follows to keep the chip load.",
    );
  } else if (n < minRpm) {
    change(
      s,
      "spindle-speed-range",
      "rpm",
      "spindleSpeed",
      minRpm,
      "Your spindle cannot turn as slowly as the vendor's test machine, so it runs at its lowest speed and the feed follows to keep the chip load.",
    );
  }
  const de = effectiveDiameter(s, s.axialDepthMm);
  s.effectiveDiameterMm = de;
  const window = s.input.material.cuttingSpeedWindowMpm;
  if (!s.input.ballNose || !window || de >= s.input.operation.diameterMm) return;
  const wanted = Math.min(maxRpm, (1000 * window[0]) / (Math.PI * de));
  if (wanted > s.rpm * (1 + 1e-9)) {
    change(
      s,
      "spindle-speed-range",
      "rpm",
      "spindleSpeed",
      wanted,
      "This shallow ball-nose cut meets the material on a circle smaller than the cutter, so the cutting speed there is below the material's window; the spindle speeds up toward the window, within its top speed.",
    );
  }
}
