import type { CalculateBody } from "@/content-schema/calculate";
import {
  hpToKw,
  inMinToMmMin,
  inToMm,
  lbfToN,
  psiToNmm2,
  sfmToMpm,
  type AdaptInput,
} from "@/lib/machining";

type Q<U extends string> = { value: number; unit: U };

const mm = (q: Q<"mm" | "in">) => (q.unit === "in" ? inToMm(q.value) : q.value);
const mmOpt = (q: Q<"mm" | "in"> | undefined) => (q ? mm(q) : undefined);
const mmMin = (q: Q<"mm/min" | "m/min" | "in/min">) =>
  q.unit === "in/min" ? inMinToMmMin(q.value) : q.unit === "m/min" ? q.value * 1000 : q.value;
const mpm = (v: number, unit: "m/min" | "SFM") => (unit === "SFM" ? sfmToMpm(v) : v);
const kw = (q: Q<"kW" | "W" | "hp">) => (q.unit === "hp" ? hpToKw(q.value) : q.unit === "W" ? q.value / 1000 : q.value);
const newton = (q: Q<"N" | "lbf">) => (q.unit === "lbf" ? lbfToN(q.value) : q.value);
const nmm2 = (q: Q<"N/mm²" | "N/mm2" | "MPa" | "psi">) => (q.unit === "psi" ? psiToNmm2(q.value) : q.value);

/** Converts a validated body to the engine's metric input. */
export function toEngineInput(body: CalculateBody): AdaptInput {
  const { operation: op, material: mat, machine: m, overrides = {}, options = {} } = body;
  const window = mat.cuttingSpeedWindow;
  return {
    operation: {
      kind: op.kind,
      diameterMm: mm(op.diameter),
      flutes: op.flutes,
      rpm: op.spindleSpeed.value,
      feedMmMin: mmMin(op.feed),
      axialDepthMm: mm(op.axialDepth),
      radialDepthMm: mm(op.radialDepth),
      plungeFeedMmMin: op.plungeFeed ? mmMin(op.plungeFeed) : undefined,
      cornerRadiusMm: op.cornerRadius ? (op.cornerRadius.unit === "in" ? inToMm(op.cornerRadius.value) : op.cornerRadius.value) : undefined,
      stickoutMm: mmOpt(op.stickout),
    },
    material: {
      cuttingSpeedWindowMpm: window ? [mpm(window.min, window.unit), mpm(window.max, window.unit)] : undefined,
      minChipLoadMm: mat.minChipLoad ? (mat.minChipLoad.unit === "in/tooth" ? inToMm(mat.minChipLoad.value) : mat.minChipLoad.value) : undefined,
      specificCuttingForceNmm2: mat.specificCuttingForce ? nmm2(mat.specificCuttingForce) : undefined,
    },
    referenceMachine: { rigidity: body.referenceMachine.rigidity },
    machine: {
      minRpm: m.spindleSpeed.min,
      maxRpm: m.spindleSpeed.max,
      maxFeedMmMin: mmMin(m.maxFeed),
      spindlePowerKw: kw(m.spindlePower),
      rigidity: m.rigidity,
      zThrustN: m.zThrust ? newton(m.zThrust) : undefined,
    },
    overrides: {
      radialDepthMm: mmOpt(overrides.radialDepth),
      axialDepthMm: mmOpt(overrides.axialDepth),
      stickoutMm: mmOpt(overrides.stickout),
    },
    options: {
      usablePowerFraction: options.usablePowerFraction,
      deflectionLimitMm: mmOpt(options.deflectionLimit),
      spindleEfficiency: options.spindleEfficiency,
      toolMaterial: options.toolMaterial,
      youngsModulusGPa: options.youngsModulus?.value,
      rampThresholdDiameterMm: mmOpt(options.rampThresholdDiameter),
    },
  };
}
