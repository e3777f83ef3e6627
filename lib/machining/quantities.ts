import * as u from "./units";

export type UnitSystem = "metric" | "imperial";

/** Every quantity the engine reports, with its metric (internal) and imperial unit. */
export const QUANTITIES = {
  length: { metric: "mm", imperial: "in", toImperial: u.mmToIn, toMetric: u.inToMm },
  deflection: { metric: "mm", imperial: "in", toImperial: u.mmToIn, toMetric: u.inToMm },
  cuttingSpeed: { metric: "m/min", imperial: "SFM", toImperial: u.mpmToSfm, toMetric: u.sfmToMpm },
  feedRate: { metric: "mm/min", imperial: "in/min", toImperial: u.mmMinToInMin, toMetric: u.inMinToMmMin },
  chipLoad: { metric: "mm/tooth", imperial: "in/tooth", toImperial: u.mmToIn, toMetric: u.inToMm },
  feedPerRev: { metric: "mm/rev", imperial: "in/rev", toImperial: u.mmToIn, toMetric: u.inToMm },
  spindleSpeed: { metric: "rpm", imperial: "rpm", toImperial: (v: number) => v, toMetric: (v: number) => v },
  power: { metric: "kW", imperial: "hp", toImperial: u.kwToHp, toMetric: u.hpToKw },
  force: { metric: "N", imperial: "lbf", toImperial: u.nToLbf, toMetric: u.lbfToN },
  torque: { metric: "N·m", imperial: "lbf·ft", toImperial: u.nmToLbfFt, toMetric: u.lbfFtToNm },
  removalRate: { metric: "cm³/min", imperial: "in³/min", toImperial: u.cm3ToIn3, toMetric: u.in3ToCm3 },
  specificCuttingForce: { metric: "N/mm²", imperial: "psi", toImperial: u.nmm2ToPsi, toMetric: u.psiToNmm2 },
} as const;

export type QuantityKind = keyof typeof QUANTITIES;
export const QUANTITY_KINDS = Object.keys(QUANTITIES) as QuantityKind[];

export interface UnitValue {
  value: number;
  unit: string;
}

/** Converts a metric (engine) value to the imperial display unit. */
export const toImperial = (value: number, kind: QuantityKind): UnitValue => ({
  value: QUANTITIES[kind].toImperial(value),
  unit: QUANTITIES[kind].imperial,
});

/** Converts an imperial value back to the engine's metric unit. */
export const toMetric = (value: number, kind: QuantityKind): UnitValue => ({
  value: QUANTITIES[kind].toMetric(value),
  unit: QUANTITIES[kind].metric,
});

export const unitOf = (kind: QuantityKind, system: UnitSystem) => QUANTITIES[kind][system];
