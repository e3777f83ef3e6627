import { ROUNDING } from "./format-rounding";
import { QUANTITIES, type QuantityKind, type UnitSystem } from "./quantities";

/** Number and unit are always joined by a no-break space. */
export const UNIT_SEPARATOR = "\u00a0";

/** Formats a value already in the display unit of `system`; "—" for a missing or non-finite value. */
export function formatDisplayValue(value: number | null | undefined, kind: QuantityKind, system: UnitSystem): string {
  const unit = QUANTITIES[kind][system];
  if (typeof value !== "number" || !Number.isFinite(value)) return "—";
  return `${ROUNDING[kind][system](value)}${UNIT_SEPARATOR}${unit}`;
}

/** Formats an engine (metric) value in the chosen system, converting as needed. */
export function formatQuantity(value: number | null | undefined, kind: QuantityKind, system: UnitSystem): string {
  if (typeof value !== "number" || !Number.isFinite(value)) return "—";
  return formatDisplayValue(system === "imperial" ? QUANTITIES[kind].toImperial(value) : value, kind, system);
}

/** The rounded number alone, without its unit (for table cells with a unit header). */
export function formatNumber(value: number, kind: QuantityKind, system: UnitSystem): string {
  if (!Number.isFinite(value)) return "—";
  return ROUNDING[kind][system](system === "imperial" ? QUANTITIES[kind].toImperial(value) : value);
}

export const formatLength = (mm: number, system: UnitSystem) => formatQuantity(mm, "length", system);
export const formatFeed = (mmMin: number, system: UnitSystem) => formatQuantity(mmMin, "feedRate", system);
export const formatCuttingSpeed = (mpm: number, system: UnitSystem) => formatQuantity(mpm, "cuttingSpeed", system);
export const formatChipLoad = (mm: number, system: UnitSystem) => formatQuantity(mm, "chipLoad", system);
export const formatSpindleSpeed = (rpm: number) => formatQuantity(rpm, "spindleSpeed", "metric");
export const formatPower = (kw: number, system: UnitSystem) => formatQuantity(kw, "power", system);
export const formatForce = (n: number, system: UnitSystem) => formatQuantity(n, "force", system);
export const formatTorque = (nm: number, system: UnitSystem) => formatQuantity(nm, "torque", system);
export const formatRemovalRate = (cm3: number, system: UnitSystem) => formatQuantity(cm3, "removalRate", system);
