import { QUANTITIES, QUANTITY_KINDS, type QuantityKind, type UnitSystem } from "../quantities";

// Messages are built on every adaptation and most are never read, so this rounds to about three
// significant figures and joins whole numbers (cheap to print) instead of printing a fraction; the
// shop rounding of lib/machining/format.ts is for tables.
const decimalsFor = (a: number) => (a >= 100 ? 0 : a >= 10 ? 1 : a >= 1 ? 2 : a >= 0.1 ? 3 : a >= 0.01 ? 4 : 5);
const POW = [1, 10, 100, 1000, 10000, 100000];

/** |v| scaled to `d` decimals and rounded, written with trailing zeros dropped (no sign). */
function digits(scaled: number, d: number): string {
  let decimals = d;
  while (decimals > 0 && scaled % 10 === 0) {
    scaled /= 10;
    decimals--;
  }
  const whole = Math.floor(scaled / POW[decimals]);
  if (decimals === 0) return String(whole);
  const frac = String(scaled - whole * POW[decimals]).padStart(decimals, "0");
  return `${whole}.${frac}`;
}

// With decimals, a rounded value has at most three significant digits, so it is one of 0–1000 at each
// of the five scales: its text is written once, on first use, and looked up after that (per unit, with
// the unit joined, so a message does not join it again).
const MAX_SCALED = 1000;
const SLOTS = (MAX_SCALED + 1) * POW.length;

interface Unit {
  suffix: string;
  written: (string | undefined)[] | null;
}

/** `value` rounded to about three significant figures, followed by `unit.suffix`. */
function short(v: number, unit: Unit): string {
  const a = Math.abs(v);
  const d = decimalsFor(a);
  const scaled = Math.round(a * POW[d]);
  const sign = v < 0 && scaled > 0 ? "-" : "";
  if (d === 0) return sign + scaled + unit.suffix;
  if (!(scaled <= MAX_SCALED)) return sign + digits(scaled, d) + unit.suffix;
  const written = unit.written ?? (unit.written = new Array<string | undefined>(SLOTS).fill(undefined));
  const slot = d * (MAX_SCALED + 1) + scaled;
  const text = written[slot] ?? (written[slot] = digits(scaled, d) + unit.suffix);
  return sign + text;
}

const unit = (text: string): Unit => ({ suffix: `\u00a0${text}`, written: null });

// Each quantity's units, in a Map: most callers read metric, and a Map lookup is cheaper than a keyed
// load on QUANTITIES with a different kind from each call site.
const METRIC: ReadonlyMap<QuantityKind, Unit> = new Map(QUANTITY_KINDS.map((k) => [k, unit(QUANTITIES[k].metric)]));
const IMPERIAL: ReadonlyMap<QuantityKind, Unit> = new Map(QUANTITY_KINDS.map((k) => [k, unit(QUANTITIES[k].imperial)]));
const NO_UNIT: Unit = { suffix: "", written: null };

/** A number with its unit, in the caller's unit system, for a warning or error message. */
export function say(units: UnitSystem, value: number, kind: QuantityKind): string {
  if (units === "metric") return short(value, METRIC.get(kind) ?? NO_UNIT);
  return short(units === "imperial" ? QUANTITIES[kind].toImperial(value) : value, IMPERIAL.get(kind) ?? NO_UNIT);
}
