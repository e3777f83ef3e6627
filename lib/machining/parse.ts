import { MachiningInputError } from "./errors";
import {
  CHIP_ALIASES,
  CUTTING_SPEED_ALIASES,
  FEED_ALIASES,
  LENGTH_ALIASES,
  SPEED_ALIASES,
  type FeedUnit,
  type LengthUnit,
} from "./parse-aliases";
import { splitQuantity } from "./parse-number";
import { M_PER_FOOT, MM_PER_INCH } from "./units";

const finite = (value: number, field: string, text: string) => {
  if (!Number.isFinite(value)) throw new MachiningInputError(field, `“${text}” is out of range.`);
  return value;
};

export interface ParseLengthOptions {
  /** Unit of a bare decimal (default "mm"). A bare fraction is always inches, by trade convention. */
  defaultUnit?: LengthUnit;
  field?: string;
}

/** Length in mm from `6 mm`, `3.175mm`, `0.125"`, `.125in`, `1/8`, `1 1/4"`, `1-1/4 in`. */
export function parseLength(text: string, options: ParseLengthOptions = {}): number {
  const field = options.field ?? "length";
  const { number, unit } = splitQuantity(text, LENGTH_ALIASES, field, "length (for example 6 mm or 1/4 in)");
  const resolved = unit ?? (number.fraction ? "in" : (options.defaultUnit ?? "mm"));
  const factor = resolved === "in" ? MM_PER_INCH : resolved === "cm" ? 10 : 1;
  return finite(number.value * factor, field, text);
}

/** Feed rate in mm/min from `1800 mm/min`, `1.8 m/min`, `70 in/min`, `70 ipm`. */
export function parseFeed(text: string, options: { defaultUnit?: FeedUnit; field?: string } = {}): number {
  const field = options.field ?? "feed";
  const { number, unit } = splitQuantity(text, FEED_ALIASES, field, "feed rate (for example 1800 mm/min or 70 in/min)");
  const resolved = unit ?? options.defaultUnit ?? "mm/min";
  const factor = resolved === "in/min" ? MM_PER_INCH : resolved === "m/min" ? 1000 : 1;
  return finite(number.value * factor, field, text);
}

/** Spindle speed in rpm from `18000`, `18000 rpm`, `18,000 rpm`, `18k rpm`. */
export function parseSpindleSpeed(text: string, options: { field?: string } = {}): number {
  const field = options.field ?? "spindleSpeed";
  const cleaned = typeof text === "string" ? text.replace(/(\d),(?=\d{3}\b)/g, "$1") : text;
  const { number, unit } = splitQuantity(cleaned, SPEED_ALIASES, field, "spindle speed (for example 18000 rpm)");
  if (number.fraction) throw new MachiningInputError(field, `“${text}” is not a spindle speed.`);
  return finite(number.value * (unit === "krpm" ? 1000 : 1), field, text);
}

/** Chip load (feed per tooth) in mm from `0.05 mm`, `0.002 in`, `0.002"`, `0.002 ipt`. */
export function parseChipLoad(text: string, options: { defaultUnit?: LengthUnit; field?: string } = {}): number {
  const field = options.field ?? "chipLoad";
  const { number, unit } = splitQuantity(text, CHIP_ALIASES, field, "chip load (for example 0.05 mm or 0.002 in)");
  const resolved = unit ?? options.defaultUnit ?? "mm";
  return finite(number.value * (resolved === "in" ? MM_PER_INCH : 1), field, text);
}

/** Cutting speed in m/min from `200 m/min`, `650 SFM`, `650 ft/min`. */
export function parseCuttingSpeed(text: string, options: { field?: string } = {}): number {
  const field = options.field ?? "cuttingSpeed";
  const { number, unit } = splitQuantity(text, CUTTING_SPEED_ALIASES, field, "cutting speed (for example 200 m/min or 650 SFM)");
  return finite(number.value * (unit === "sfm" ? M_PER_FOOT : 1), field, text);
}
