import type { CalculateBody } from "@/content-schema/calculate";
import { hpToKw, inMinToMmMin, inToMm, lbfToN, psiToNmm2, sfmToMpm, type AdaptInput } from "@/lib/machining";

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
  const { operation: op, material: mat, referenceMachine: ref, machine: m, overrides = {}, options = {} } = body;
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
      fluteLengthMm: mmOpt(op.fluteLength),
      cornerForm: op.cornerForm,
      entry: op.entry,
      rampAngleDeg: op.rampAngle?.value,
    },
    material: {
      cuttingSpeedWindowMpm: window ? [mpm(window.min, window.unit), mpm(window.max, window.unit)] : undefined,
      minChipLoadMm: mat.minChipLoad
        ? mat.minChipLoad.unit === "in/tooth"
          ? inToMm(mat.minChipLoad.value)
          : mat.minChipLoad.value
        : undefined,
      specificCuttingForceNmm2: mat.specificCuttingForce ? nmm2(mat.specificCuttingForce) : undefined,
      chipLoadPctOfD: mat.chipLoadBand ? { min: mat.chipLoadBand.min / 100, max: mat.chipLoadBand.max / 100 } : undefined,
      kc11Nmm2: mat.kc11 ? nmm2(mat.kc11) : undefined,
      mc: mat.mc,
      meltsWhenRubbing: mat.meltsWhenRubbing,
    },
    referenceMachine: {
      rigidity: ref.rigidity,
      rigidityClass: ref.rigidityClass,
      zThrustN: ref.zThrust ? newton(ref.zThrust) : undefined,
      maxFeedMmMin: ref.maxFeed ? mmMin(ref.maxFeed) : undefined,
      maxRpm: ref.maxSpindleSpeed?.value,
    },
    machine: {
      minRpm: m.spindleSpeed.min,
      maxRpm: m.spindleSpeed.max,
      maxFeedMmMin: mmMin(m.maxFeed),
      spindlePowerKw: kw(m.spindlePower),
      rigidity: m.rigidity,
      zThrustN: m.zThrust ? newton(m.zThrust) : undefined,
      ratedRpm: m.ratedSpindleSpeed?.value,
      spindleKind: m.spindleKind,
      rigidityClass: m.rigidityClass,
    },
    entryCapability: body.entryCapability,
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
      slottingFactor: options.slottingFactor,
      radialForceRatio: options.radialForceRatio,
      messageUnits: body.units,
    },
  };
}
