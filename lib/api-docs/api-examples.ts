import { runCalculation } from "@/lib/adapt/calculate/run-calculation";

// Invented example requests, one per unit system. The calculate answers are computed by the engine when the
// document is built, so they always show what the API really answers.

export const calculateMetricExample = {
  units: "metric",
  operation: {
    kind: "slotting",
    diameter: { value: 6, unit: "mm" },
    flutes: 2,
    spindleSpeed: { value: 18000, unit: "rpm" },
    feed: { value: 1800, unit: "mm/min" },
    axialDepth: { value: 1.5, unit: "mm" },
    radialDepth: { value: 6, unit: "mm" },
    stickout: { value: 20, unit: "mm" },
  },
  material: {
    cuttingSpeedWindow: { min: 150, max: 500, unit: "m/min" },
    minChipLoad: { value: 0.05, unit: "mm/tooth" },
    specificCuttingForce: { value: 150, unit: "N/mm²" },
  },
  referenceMachine: { rigidity: 0.8 },
  machine: {
    spindleSpeed: { min: 8000, max: 24000, unit: "rpm" },
    maxFeed: { value: 5000, unit: "mm/min" },
    spindlePower: { value: 2.2, unit: "kW" },
    rigidity: 0.8,
  },
} as const;

export const calculateImperialExample = {
  units: "imperial",
  operation: {
    kind: "profile",
    diameter: { value: 0.25, unit: "in" },
    flutes: 2,
    spindleSpeed: { value: 18000, unit: "rpm" },
    feed: { value: 70, unit: "in/min" },
    axialDepth: { value: 0.25, unit: "in" },
    radialDepth: { value: 0.05, unit: "in" },
    stickout: { value: 0.875, unit: "in" },
  },
  material: {
    cuttingSpeedWindow: { min: 500, max: 1500, unit: "SFM" },
    minChipLoad: { value: 0.001, unit: "in/tooth" },
    specificCuttingForce: { value: 150, unit: "N/mm2" },
  },
  referenceMachine: { rigidity: 0.8 },
  machine: {
    spindleSpeed: { min: 8000, max: 24000, unit: "rpm" },
    maxFeed: { value: 200, unit: "in/min" },
    spindlePower: { value: 3, unit: "hp" },
    rigidity: 0.8,
  },
} as const;

export function calculateAnswer(body: unknown): unknown {
  const outcome = runCalculation(body);
  return outcome.ok ? outcome.result : { error: "invalid_input", message: outcome.message, fieldErrors: outcome.errors };
}

export const machineMetricExample = {
  name: "Shop router",
  rpmMin: 8000,
  rpmMax: 24000,
  powerKw: 2.2,
  maxFeedMmMin: "5000 mm/min",
  rigidity: "moderate",
  stickoutMm: "20 mm",
  units: "metric",
};
export const machineImperialExample = {
  name: "Garage router",
  rpmMin: 10000,
  rpmMax: 30000,
  powerKw: 1.25,
  maxFeedMmMin: "150 in/min",
  rigidity: "light",
  stickoutMm: "3/4 in",
  units: "imperial",
};

export const setupExampleMetric = {
  versionId: "3f0c2a1e-8a4b-4c55-9d1e-2b7f6a0c9e11",
  machineId: "7d2e9b40-1c3a-4f6e-8b5d-0a9c8e7f6d21",
  operationIndex: 0,
  name: "Sign blanks, 6 mm slot",
  units: "metric",
  radialDepthMm: "3 mm",
};
export const setupExampleImperial = {
  versionId: "3f0c2a1e-8a4b-4c55-9d1e-2b7f6a0c9e11",
  machineId: "7d2e9b40-1c3a-4f6e-8b5d-0a9c8e7f6d21",
  operationIndex: 0,
  name: "Sign blanks, 1/4 in slot",
  units: "imperial",
  axialDepthMm: "0.06 in",
  stickoutMm: '7/8"',
};

export const errorExamples = {
  invalid: {
    summary: "A field is wrong (400)",
    value: { error: "invalid_input", message: "The request is not valid.", fieldErrors: { subject: ["Give the ticket a short subject."] } },
  },
  notFound: { summary: "Unknown, or another vendor's (404)", value: { error: "not_found", message: "Not found." } },
  limited: {
    summary: "Too many calls (429, with Retry-After)",
    value: { error: "rate_limited", message: "Too many attempts. Try again in 12 s." },
  },
};
