import {
  formatDisplayValue,
  QUANTITIES,
  RULES,
  WARNING_CODES,
  type AdaptNumbers,
  type AdaptResult,
  type QuantityKind,
  type UnitSystem,
} from "@/lib/machining";

import { apiName } from "./field-paths";

export interface DisplayQuantity {
  value: number;
  unit: string;
  text: string;
}

export type BothSystems = Record<UnitSystem, DisplayQuantity>;

const OUTPUT_KINDS: Record<keyof AdaptNumbers, QuantityKind> = {
  rpm: "spindleSpeed",
  feedMmMin: "feedRate",
  chipLoadMm: "chipLoad",
  maxChipThicknessMm: "chipLoad",
  cuttingSpeedMpm: "cuttingSpeed",
  axialDepthMm: "length",
  radialDepthMm: "length",
  plungeFeedMmMin: "feedRate",
  mrrCm3Min: "removalRate",
  powerKw: "power",
  torqueNm: "torque",
  forceN: "force",
  deflectionMm: "deflection",
  meanChipThicknessMm: "chipLoad",
  effectiveDiameterMm: "length",
  peakForceN: "force",
  availablePowerKw: "power",
  plungeThrustN: "force",
  plungeFeedPerRevMm: "feedPerRev",
};

export function display(metricValue: number, kind: QuantityKind, system: UnitSystem): DisplayQuantity {
  const value = system === "imperial" ? QUANTITIES[kind].toImperial(metricValue) : metricValue;
  return { value, unit: QUANTITIES[kind][system], text: formatDisplayValue(value, kind, system) };
}

const both = (metricValue: number, kind: QuantityKind): BothSystems => ({
  metric: display(metricValue, kind, "metric"),
  imperial: display(metricValue, kind, "imperial"),
});

// Worked out once: the output fields with their API names and kinds, and each rule's title by id.
const OUTPUTS = (Object.entries(OUTPUT_KINDS) as [keyof AdaptNumbers, QuantityKind][]).map(([field, kind]) => ({
  field,
  kind,
  name: apiName(field),
}));
const RULE_TITLES = new Map<string, string>(RULES.map((r) => [r.id, r.title]));

function block(result: AdaptResult, system: UnitSystem) {
  const out: Record<string, DisplayQuantity | null> = {};
  for (const { field, kind, name } of OUTPUTS) {
    const v = result[field];
    out[name] = v === null ? null : display(v, kind, system);
  }
  return out;
}

/** The adapted recipe in both unit systems, with warnings and explained steps. */
export function presentResult(result: AdaptResult, units: UnitSystem) {
  return {
    units,
    metric: block(result, "metric"),
    imperial: block(result, "imperial"),
    warnings: result.warnings.map((w) => ({
      code: w.code,
      title: WARNING_CODES[w.code].title,
      message: w.message,
      values: (w.values ?? []).map((v) => ({ name: apiName(v.name), ...both(v.value, v.quantity) })),
    })),
    steps: result.steps.map((s) => ({
      rule: s.rule,
      title: RULE_TITLES.get(s.rule) ?? s.rule,
      field: apiName(s.field),
      before: both(s.before, s.quantity),
      after: both(s.after, s.quantity),
      why: s.why,
      source: s.source,
    })),
  };
}

export type CalculationResult = ReturnType<typeof presentResult>;
