import { inToMm, mmToIn } from "@/lib/machining";

/** Fractional-inch cutter sizes are multiples of 1/64 in. */
const STEPS_PER_INCH = 64;
/**
 * A decimal inch value this close to a 1/64 multiple is that fraction: people write 1/16 as
 * `.063` or `0.0625`. The tolerance is below half the gap between neighbouring sizes (0.0078 in).
 */
export const INCH_SIZE_TOLERANCE_IN = 0.0005;

/** The 1/64 multiple within tolerance of `inches`, as a count of 64ths; null when there is none. */
export function nearestSixtyFourths(inches: number): number | null {
  const n = Math.round(inches * STEPS_PER_INCH);
  return n > 0 && Math.abs(inches - n / STEPS_PER_INCH) <= INCH_SIZE_TOLERANCE_IN + 1e-12 ? n : null;
}

/** Snaps an inch diameter given in mm to its fractional size, when it is one. */
export function snapInchMm(mm: number): { mm: number; sixtyFourths: number | null } {
  const n = nearestSixtyFourths(mmToIn(mm));
  return n === null ? { mm, sixtyFourths: null } : { mm: inToMm(n / STEPS_PER_INCH), sixtyFourths: n };
}

const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));

/** `1/8"`, `1 1/4"`, `1"` from a count of 64ths. */
export function formatSixtyFourths(n: number): string {
  const whole = Math.floor(n / STEPS_PER_INCH);
  const rest = n % STEPS_PER_INCH;
  if (rest === 0) return `${whole}"`;
  const g = gcd(rest, STEPS_PER_INCH);
  const fraction = `${rest / g}/${STEPS_PER_INCH / g}`;
  return whole > 0 ? `${whole} ${fraction}"` : `${fraction}"`;
}
