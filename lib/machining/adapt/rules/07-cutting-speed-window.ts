import type { UnitSystem } from "../../quantities";
import { say } from "../message-units";
import { effectiveDiameter, warn, type AdaptState } from "../state";

// Built only when a warning is given: most calls are inside the window.
const windowValues = (vc: number, window: readonly [number, number]) => [
  { name: "cuttingSpeedMpm", quantity: "cuttingSpeed" as const, value: vc },
  { name: "windowMinMpm", quantity: "cuttingSpeed" as const, value: window[0] },
  { name: "windowMaxMpm", quantity: "cuttingSpeed" as const, value: window[1] },
];

const where = (units: UnitSystem, de: number, d: number) => (de < d ? ` (at the ${say(units, de, "length")} the ball nose cuts with)` : "");

/** Rule 7: vc = π·De·n/1000 (De = D except for a shallow ball nose) checked against the material's window. */
export function cuttingSpeedWindow(s: AdaptState): void {
  s.effectiveDiameterMm = effectiveDiameter(s, s.axialDepthMm);
  s.cuttingSpeedMpm = (Math.PI * s.effectiveDiameterMm * s.rpm) / 1000;
  const window = s.input.material.cuttingSpeedWindowMpm;
  if (!window) return;
  const units = s.input.units;
  const de = s.effectiveDiameterMm;
  const vc = s.cuttingSpeedMpm;
  const d = s.input.operation.diameterMm;
  if (s.cuttingSpeedMpm < window[0] * (1 - 1e-9)) {
    warn(
      s,
      "cutting-speed-below-window",
      `The cutting speed, ${say(units, vc, "cuttingSpeed")}${where(units, de, d)}, is below the range recommended for this material; expect a rougher finish and shorter tool life, and watch for built-up edge.`,
      windowValues(vc, window),
    );
  } else if (s.cuttingSpeedMpm > window[1] * (1 + 1e-9)) {
    warn(
      s,
      "cutting-speed-above-window",
      `The cutting speed, ${say(units, vc, "cuttingSpeed")}${where(units, de, d)}, is above the range recommended for this material; the tool may overheat (plastics may melt). Lower the spindle speed and the feed with it.`,
      windowValues(vc, window),
    );
  }
}
