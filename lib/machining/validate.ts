import { MachiningInputError } from "./errors";

/** A number for a message: six significant digits, so 7.619999999999999 reads 7.62. */
export const show = (value: number) => String(Number(value.toPrecision(6)));

const describe = (value: unknown) =>
  typeof value === "number" ? (Number.isFinite(value) ? show(value) : Number.isNaN(value) ? "not a number" : String(value)) : typeof value;

/** A finite number > 0. */
export function positive(value: number, field: string): number {
  if (typeof value !== "number" || !Number.isFinite(value) || value <= 0) {
    throw new MachiningInputError(field, `${field} must be a finite number above zero (got ${describe(value)}).`);
  }
  return value;
}

/** A finite number in (0, max]: rejects sizes no machine shop has, which would overflow later. */
export function bounded(value: number, field: string, max: number): number {
  positive(value, field);
  if (value > max) throw new MachiningInputError(field, `${field} must be at most ${show(max)} (got ${show(value)}).`);
  return value;
}

/** A finite number ≥ 0. */
export function nonNegative(value: number, field: string): number {
  if (typeof value !== "number" || !Number.isFinite(value) || value < 0) {
    throw new MachiningInputError(field, `${field} must be a finite number, zero or above (got ${describe(value)}).`);
  }
  return value;
}

/** A finite number in (0, max]. */
export function fraction(value: number, field: string, max = 1): number {
  positive(value, field);
  if (value > max) throw new MachiningInputError(field, `${field} must be at most ${max} (got ${show(value)}).`);
  return value;
}

/** A whole number ≥ 1 (flute count). */
export function count(value: number, field: string): number {
  positive(value, field);
  if (!Number.isInteger(value)) throw new MachiningInputError(field, `${field} must be a whole number (got ${show(value)}).`);
  return value;
}

/** Radial depth in (0, D]. */
export function radialDepth(ae: number, diameter: number, field: string): number {
  positive(ae, field);
  if (ae > diameter * (1 + 1e-12)) {
    throw new MachiningInputError(field, `${field} (${show(ae)} mm) cannot exceed the cutter diameter (${show(diameter)} mm).`);
  }
  return Math.min(ae, diameter);
}

/** Checks min ≤ max; the error names the max field. */
export function ordered(min: number, max: number, minField: string, maxField: string): void {
  if (min > max) throw new MachiningInputError(maxField, `${maxField} (${show(max)}) is below ${minField} (${show(min)}).`);
}
