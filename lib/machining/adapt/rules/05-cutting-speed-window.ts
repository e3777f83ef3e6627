import { warn, type AdaptState } from "../state";

/** Rule 5: vc = π·D·n/1000 checked against the material's window. */
export function cuttingSpeedWindow(s: AdaptState): void {
  s.cuttingSpeedMpm = (Math.PI * s.input.operation.diameterMm * s.rpm) / 1000;
  const window = s.input.material.cuttingSpeedWindowMpm;
  if (!window) return;
  const values = [
    { name: "cuttingSpeedMpm", quantity: "cuttingSpeed" as const, value: s.cuttingSpeedMpm },
    { name: "windowMinMpm", quantity: "cuttingSpeed" as const, value: window[0] },
    { name: "windowMaxMpm", quantity: "cuttingSpeed" as const, value: window[1] },
  ];
  if (s.cuttingSpeedMpm < window[0] * (1 - 1e-9)) {
    warn(s, "cutting-speed-below-window", "The cutting speed is below the range recommended for this material; expect a rougher finish and shorter tool life, and watch for built-up edge.", values);
  } else if (s.cuttingSpeedMpm > window[1] * (1 + 1e-9)) {
    warn(s, "cutting-speed-above-window", "The cutting speed is above the range recommended for this material; the tool may overheat (plastics may melt). Lower the spindle speed and the feed with it.", values);
  }
}
