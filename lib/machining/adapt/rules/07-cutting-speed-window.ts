import { say } from "../message-units";
import { effectiveDiameter, warn, type AdaptState } from "../state";

/** Rule 7: vc = π·De·n/1000 (De = D except for a shallow ball nose) checked against the material's window. */
export function cuttingSpeedWindow(s: AdaptState): void {
  s.effectiveDiameterMm = effectiveDiameter(s, s.axialDepthMm);
  s.cuttingSpeedMpm = (Math.PI * s.effectiveDiameterMm * s.rpm) / 1000;
  const window = s.input.material.cuttingSpeedWindowMpm;
  if (!window) return;
  const units = s.input.units;
  const values = [
    { name: "cuttingSpeedMpm", quantity: "cuttingSpeed" as const, value: s.cuttingSpeedMpm },
    { name: "windowMinMpm", quantity: "cuttingSpeed" as const, value: window[0] },
    { name: "windowMaxMpm", quantity: "cuttingSpeed" as const, value: window[1] },
  ];
  const where = s.effectiveDiameterMm < s.input.operation.diameterMm ? ` (at the ${say(units, s.effectiveDiameterMm, "length")} the ball nose cuts with)` : "";
  const range = `${say(units, window[0], "cuttingSpeed")} to ${say(units, window[1], "cuttingSpeed")}`;
  if (s.cuttingSpeedMpm < window[0] * (1 - 1e-9)) {
    warn(s, "cutting-speed-below-window", `The cutting speed, ${say(units, s.cuttingSpeedMpm, "cuttingSpeed")}${where}, is below the ${range} recommended for this material; expect a rougher finish and shorter tool life, and watch for built-up edge.`, values);
  } else if (s.cuttingSpeedMpm > window[1] * (1 + 1e-9)) {
    warn(s, "cutting-speed-above-window", `The cutting speed, ${say(units, s.cuttingSpeedMpm, "cuttingSpeed")}${where}, is above the ${range} recommended for this material; the tool may overheat (plastics may melt). Lower the spindle speed and the feed with it.`, values);
  }
}
