import { MachiningInputError } from "./errors";

export interface ParsedNumber {
  value: number;
  /** True when written as a fraction or mixed number (`1/8`, `1 1/4`, `1-1/4`). */
  fraction: boolean;
}

const DECIMAL = /^(?:\d+(?:\.\d*)?|\.\d+)$/;
const FRACTION = /^(\d+)\/(\d+)$/;
const MIXED = /^(\d+)(?:\s+|-)(\d+)\/(\d+)$/;

/** Reads a non-negative decimal, fraction or mixed number; null when it is none of these. */
export function readNumber(text: string): ParsedNumber | null {
  const s = text.trim();
  if (DECIMAL.test(s)) return { value: Number(s), fraction: false };
  const mixed = MIXED.exec(s);
  if (mixed) {
    const den = Number(mixed[3]);
    if (den === 0) return null;
    return { value: Number(mixed[1]) + Number(mixed[2]) / den, fraction: true };
  }
  const frac = FRACTION.exec(s);
  if (frac) {
    const den = Number(frac[2]);
    if (den === 0) return null;
    return { value: Number(frac[1]) / den, fraction: true };
  }
  return null;
}

export interface UnitAlias<U extends string> {
  alias: string;
  unit: U;
}

/** Splits `text` into number and unit, matching the longest known unit suffix. */
export function splitQuantity<U extends string>(
  text: unknown,
  aliases: readonly UnitAlias<U>[],
  field: string,
  expected: string,
): { number: ParsedNumber; unit: U | null } {
  if (typeof text !== "string" || text.trim() === "") {
    throw new MachiningInputError(field, `Enter a ${expected}.`);
  }
  const s = text
    .trim()
    .toLowerCase()
    .replace(/[\u00a0\u2009\u202f]/g, " ");
  for (const { alias, unit } of aliases) {
    if (s.endsWith(alias)) {
      const number = readNumber(s.slice(0, s.length - alias.length));
      if (number) return { number, unit };
    }
  }
  const number = readNumber(s);
  if (number) return { number, unit: null };
  throw new MachiningInputError(field, `“${text.trim()}” is not a ${expected}.`);
}

/** Sorts aliases longest first so `mm/min` wins over `m/min`. */
export const byLength = <U extends string>(list: UnitAlias<U>[]) => [...list].sort((a, b) => b.alias.length - a.alias.length);
