import type { QuantityKind, UnitSystem } from "./quantities";
import { fixed, toPrecision3 } from "./round-decimal";

/** Fixed decimals, then trailing zeros dropped down to `keep` decimals. */
const trimmed = (value: number, decimals: number, keep = 0) => {
  let s = fixed(value, decimals);
  if (!s.includes(".")) return s;
  const minLength = s.indexOf(".") + (keep > 0 ? keep + 1 : 0);
  while (s.length > minLength && s.endsWith("0")) s = s.slice(0, -1);
  return s.endsWith(".") ? s.slice(0, -1) : s;
};

const bySize = (value: number, small: number, large: number, threshold: number) =>
  fixed(value, Math.abs(value) < threshold ? small : large);

/** Three significant figures, zeros kept (0.0500, 0.00200, 0.250): chip loads read alike in both systems. */
const significant3 = (value: number) => {
  if (value === 0) return "0.000";
  const rounded = toPrecision3(value);
  return fixed(rounded, Math.max(0, 2 - Math.floor(Math.log10(Math.abs(rounded)))));
};

/** Three decimals below 1, two below 10, one above (kW, hp, N·m, lbf·ft). */
const tiered = (value: number) => fixed(value, Math.abs(value) < 1 ? 3 : Math.abs(value) < 10 ? 2 : 1);

type Rounder = (value: number) => string;

// Shop-floor rounding per quantity and system (value already in the display unit).
export const ROUNDING: Record<QuantityKind, Record<UnitSystem, Rounder>> = {
  length: { metric: (v) => trimmed(v, 3), imperial: (v) => trimmed(v, 4) },
  deflection: { metric: (v) => fixed(v, Math.abs(v) < 0.01 ? 4 : 3), imperial: (v) => fixed(v, Math.abs(v) < 0.001 ? 5 : 4) },
  cuttingSpeed: { metric: (v) => bySize(v, 1, 0, 100), imperial: (v) => fixed(v, 0) },
  feedRate: { metric: (v) => fixed(v, 0), imperial: (v) => fixed(v, 1) },
  chipLoad: { metric: significant3, imperial: significant3 },
  feedPerRev: { metric: (v) => trimmed(v, 4, 3), imperial: (v) => fixed(v, Math.abs(v) < 0.001 ? 5 : 4) },
  spindleSpeed: { metric: roundRpm, imperial: roundRpm },
  power: { metric: tiered, imperial: tiered },
  force: { metric: (v) => bySize(v, 1, 0, 10), imperial: (v) => bySize(v, 1, 0, 100) },
  torque: { metric: tiered, imperial: tiered },
  removalRate: { metric: (v) => bySize(v, 2, 1, 10), imperial: (v) => bySize(v, 3, 2, 1) },
  specificCuttingForce: { metric: (v) => fixed(v, 0), imperial: (v) => fixed(v, 0) },
};

/** rpm to the nearest 10 from 1000 up, whole below. */
function roundRpm(value: number): string {
  return Math.abs(value) >= 1000 ? fixed(Math.round(value / 10) * 10, 0) : fixed(value, 0);
}
