import { formatQuantity } from "../format";
import type { QuantityKind, UnitSystem } from "../quantities";

/** A number with its unit, in the caller's unit system, for a warning or error message. */
export const say = (units: UnitSystem, value: number, kind: QuantityKind): string => formatQuantity(value, kind, units);
