import { QUANTITIES, type QuantityKind, type UnitSystem } from "../quantities";

// Messages are built on every adaptation, most never read: rounding to about three significant
// figures with arithmetic keeps them cheap (the shop rounding of lib/machining/format.ts is for tables).
const decimalsFor = (a: number) => (a >= 100 ? 0 : a >= 10 ? 1 : a >= 1 ? 2 : a >= 0.1 ? 3 : a >= 0.01 ? 4 : 5);

/** A number with its unit, in the caller's unit system, for a warning or error message. */
export function say(units: UnitSystem, value: number, kind: QuantityKind): string {
  const q = QUANTITIES[kind];
  const v = units === "imperial" ? q.toImperial(value) : value;
  const scale = 10 ** decimalsFor(Math.abs(v));
  return `${Math.round(v * scale) / scale}\u00a0${q[units]}`;
}
