// Engine field names (metric, unit-suffixed) → the body path a caller sent.
const PATHS: Record<string, string> = {
  "operation.diameterMm": "operation.diameter.value",
  "operation.rpm": "operation.spindleSpeed.value",
  "operation.feedMmMin": "operation.feed.value",
  "operation.axialDepthMm": "operation.axialDepth.value",
  "operation.radialDepthMm": "operation.radialDepth.value",
  "operation.plungeFeedMmMin": "operation.plungeFeed.value",
  "operation.cornerRadiusMm": "operation.cornerRadius.value",
  "operation.stickoutMm": "operation.stickout.value",
  "operation.fluteLengthMm": "operation.fluteLength.value",
  "operation.rampAngleDeg": "operation.rampAngle.value",
  "material.chipLoadPctOfD.min": "material.chipLoadBand.min",
  "material.chipLoadPctOfD.max": "material.chipLoadBand.max",
  "material.kc11Nmm2": "material.kc11.value",
  "referenceMachine.zThrustN": "referenceMachine.zThrust.value",
  "referenceMachine.maxFeedMmMin": "referenceMachine.maxFeed.value",
  "referenceMachine.maxRpm": "referenceMachine.maxSpindleSpeed.value",
  "machine.ratedRpm": "machine.ratedSpindleSpeed.value",
  "material.cuttingSpeedWindowMpm.0": "material.cuttingSpeedWindow.min",
  "material.cuttingSpeedWindowMpm.1": "material.cuttingSpeedWindow.max",
  "material.minChipLoadMm": "material.minChipLoad.value",
  "material.specificCuttingForceNmm2": "material.specificCuttingForce.value",
  "machine.minRpm": "machine.spindleSpeed.min",
  "machine.maxRpm": "machine.spindleSpeed.max",
  "machine.maxFeedMmMin": "machine.maxFeed.value",
  "machine.spindlePowerKw": "machine.spindlePower.value",
  "machine.zThrustN": "machine.zThrust.value",
  "overrides.radialDepthMm": "overrides.radialDepth.value",
  "overrides.axialDepthMm": "overrides.axialDepth.value",
  "overrides.stickoutMm": "overrides.stickout.value",
  "options.deflectionLimitMm": "options.deflectionLimit.value",
  "options.youngsModulusGPa": "options.youngsModulus.value",
  "options.rampThresholdDiameterMm": "options.rampThresholdDiameter.value",
};

export const bodyPathOf = (engineField: string) => PATHS[engineField] ?? engineField;

const RENAMED: Record<string, string> = {
  rpm: "spindleSpeed",
  mrrCm3Min: "removalRate",
  feedMmMin: "feed",
  plungeFeedMmMin: "plungeFeed",
  maxFeedMmMin: "maxFeed",
};
// The engine names a handful of fields, so each is worked out once.
const API_NAMES = new Map<string, string>();

/** API name of an engine output or warning value: the unit suffix is dropped (`feedMmMin` → `feed`). */
export function apiName(engineName: string): string {
  let name = API_NAMES.get(engineName);
  if (name === undefined) {
    name = RENAMED[engineName] ?? engineName.replace(/(MmMin|Mpm|Cm3Min|Mm|Kw|Nm|N)$/, "");
    if (API_NAMES.size < 500) API_NAMES.set(engineName, name);
  }
  return name;
}
