import { QUANTITIES, QUANTITY_KINDS, type QuantityKind, type UnitSystem } from "../quantities";

// Messages are built on every adaptation and most are never read, so this rounds to about three
// significant figures and joins whole numbers (cheap to print) instead of printing a fraction; the
// shop rounding of lib/machining/format.ts is for tables.
const decimalsFor = (a: number) => (a >= 100 ? 0 : a >= 10 ? 1 : a >= 1 ? 2 : a >= 0.1 ? 3 : a >= 0.01 ? 4 : 5);
const POW = [1, 10, 100, 1000, 10000, 100000];

function short(v: number): string {
  const a = Math.abs(v);
  const d = decimalsFor(a);
  let scaled = Math.round(a * POW[d]);
  const sign = v < 0 && scaled > 0 ? "-" : "";
  if (d === 0) return sign + scaled;
  let decimals = d;
  while (decimals > 0 && scaled % 10 === 0) {
    scaled /= 10;
    decimals--;
  }
  const whole = Math.floor(scaled / POW[decimals]);
  if (decimals === 0) return sign + whole;
  const frac = String(scaled - whole * POW[decimals]).padStart(decimals, "0");
  return `${sign}${whole}.${frac}`;
}

// The metric suffix of each quantity, joined once: most callers read metric, and a Map lookup is cheaper
// than a keyed load on QUANTITIES with a different kind from each call site.
const METRIC_SUFFIX: ReadonlyMap<QuantityKind, string> = new Map(QUANTITY_KINDS.map((k) => [k, `\u00a0${QUANTITIES[k].metric}`]));

/** A number with its unit, in the caller's unit system, for a warning or error message. */
export function say(units: UnitSystem, value: number, kind: QuantityKind): string {
  if (units === "metric") return short(value) + (METRIC_SUFFIX.get(kind) ?? "");
  const q = QUANTITIES[kind];
  return `${short(units === "imperial" ? q.toImperial(value) : value)}\u00a0${q[units]}`;
}
