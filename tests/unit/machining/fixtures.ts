import type { AdaptInput } from "@/lib/machining";

/**
 * A slot in which no rule changes anything (invented demo values): vc = π·6·18000/1000 = 339 m/min
 * inside [100, 500]; Pc = 3·6·1800·800/60e6 = 0.432 kW under 0.8 × P(18000) = 0.8 × 2.2 × 18000/24000
 * = 1.32 kW; feed 1800 under 10000; plunge thrust at fn = 600/18000 mm/rev is
 * 2.1·800·6·(1/30)^0.8 + 0.012·800·6² = 663.4 + 345.6 = 1009 N under the 1500 N Z axis (model 1's
 * fixture had 1000 N, which model 2's thrust estimate exceeds).
 */
export const baseInput = (): AdaptInput => ({
  operation: {
    kind: "slotting",
    diameterMm: 6,
    flutes: 2,
    rpm: 18000,
    feedMmMin: 1800,
    axialDepthMm: 3,
    radialDepthMm: 6,
    plungeFeedMmMin: 600,
    stickoutMm: 20,
  },
  material: { cuttingSpeedWindowMpm: [100, 500], minChipLoadMm: 0.02, specificCuttingForceNmm2: 800 },
  referenceMachine: { rigidity: 0.5 },
  machine: { minRpm: 6000, maxRpm: 24000, maxFeedMmMin: 10000, spindlePowerKw: 2.2, rigidity: 0.5, zThrustN: 1500 },
});

type Patch = { [K in keyof AdaptInput]?: Partial<NonNullable<AdaptInput[K]>> };

/** baseInput with some fields of each section replaced. */
export function withPatch(patch: Patch): AdaptInput {
  const base = baseInput();
  return {
    operation: { ...base.operation, ...patch.operation },
    material: { ...base.material, ...patch.material },
    referenceMachine: { ...base.referenceMachine, ...patch.referenceMachine },
    machine: { ...base.machine, ...patch.machine },
    overrides: { ...patch.overrides },
    options: { ...patch.options },
  };
}
