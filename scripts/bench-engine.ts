// Benchmark: adaptRecipe throughput on one core over a seeded, realistic mix of inputs.
// Run: npm run bench:engine
import { adaptRecipe, OPERATION_KINDS, type AdaptInput } from "../lib/machining/index";
import { prng } from "./lib/prng";

const TARGET_PER_SECOND = 500_000;
const MIX_SIZE = 2_000;
const WARMUP_CALLS = 200_000;
const THROUGHPUT_MS = 3_000;
const LATENCY_CALLS = 200_000;

// Seeded, so every run measures the same mix.
const rand = prng(0x5eed);
const between = (min: number, max: number) => min + (max - min) * rand();
const pick = <T>(list: readonly T[]) => list[Math.floor(rand() * list.length)];
const maybe = <T>(p: number, value: () => T) => (rand() < p ? value() : undefined);

function sampleInput(): AdaptInput {
  const d = pick([3, 3.175, 4, 6, 6.35, 8, 10, 12, 12.7, 16]);
  const z = pick([1, 2, 2, 3, 4]);
  const rpm = between(8000, 24000);
  const fz = between(0.01, 0.15);
  const ae = d * pick([1, 0.5, 0.3, 0.1, 0.08]);
  return {
    operation: {
      kind: pick(OPERATION_KINDS),
      diameterMm: d,
      flutes: z,
      rpm,
      feedMmMin: fz * z * rpm,
      axialDepthMm: d * between(0.2, 2.5),
      radialDepthMm: ae,
      plungeFeedMmMin: maybe(0.8, () => fz * z * rpm * 0.3),
      stickoutMm: maybe(0.8, () => d * between(3, 5)),
      fluteLengthMm: maybe(0.5, () => d * 3),
      cornerForm: maybe(0.2, () => pick(["square", "ball", "corner-radius"] as const)),
    },
    material: {
      cuttingSpeedWindowMpm: maybe(0.9, () => [between(100, 300), between(350, 900)] as const),
      minChipLoadMm: maybe(0.7, () => between(0.01, 0.08)),
      specificCuttingForceNmm2: maybe(0.9, () => between(100, 2000)),
      chipLoadPctOfD: maybe(0.6, () =>
        pick([
          { min: 0.012, max: 0.03 },
          { min: 0.005, max: 0.015 },
        ]),
      ),
      kc11Nmm2: maybe(0.4, () => between(100, 1500)),
      mc: maybe(0.4, () => between(0.15, 0.35)),
      meltsWhenRubbing: maybe(0.3, () => true),
    },
    referenceMachine: { rigidity: between(0.5, 1) },
    machine: {
      minRpm: between(3000, 8000),
      maxRpm: between(12000, 30000),
      maxFeedMmMin: between(2000, 20000),
      spindlePowerKw: between(0.3, 5),
      rigidity: between(0.2, 1),
      zThrustN: maybe(0.6, () => between(50, 1000)),
      ratedRpm: maybe(0.5, () => between(12000, 24000)),
      spindleKind: maybe(0.5, () => pick(["constant-torque", "constant-power"] as const)),
    },
    entryCapability: maybe(0.7, () => pick(["plunge-only", "ramp", "helix"] as const)),
    overrides: maybe(0.5, () => ({ radialDepthMm: d * between(0.1, 1), stickoutMm: maybe(0.5, () => d * between(2, 6)) })),
  };
}

const mix = Array.from({ length: MIX_SIZE }, sampleInput);
let sink = 0;

for (let i = 0; i < WARMUP_CALLS; i++) sink += adaptRecipe(mix[i % MIX_SIZE]).rpm;

let calls = 0;
const start = performance.now();
let elapsed = 0;
while (elapsed < THROUGHPUT_MS) {
  for (let i = 0; i < 10_000; i++, calls++) sink += adaptRecipe(mix[calls % MIX_SIZE]).feedMmMin;
  elapsed = performance.now() - start;
}
const perSecond = (calls / elapsed) * 1000;

// Baseline in the same run, so a loaded machine shows as a slower baseline rather than a slower engine:
// the plain speed-and-feed arithmetic (fz, hex, vc, vf) over the same mix, with the same loop.
const plain = (input: AdaptInput) => {
  const op = input.operation;
  const fz = op.feedMmMin / (op.flutes * op.rpm);
  const r = op.radialDepthMm / op.diameterMm;
  const hex = r >= 0.5 ? fz : fz * 2 * Math.sqrt(r * (1 - r));
  const n = Math.min(Math.max(op.rpm, input.machine.minRpm), input.machine.maxRpm);
  return {
    vc: (Math.PI * op.diameterMm * n) / 1000,
    vf: Math.min((hex / Math.max(hex, 1e-12)) * fz * op.flutes * n, input.machine.maxFeedMmMin),
  };
};
let baseCalls = 0;
const baseStart = performance.now();
let baseElapsed = 0;
while (baseElapsed < THROUGHPUT_MS) {
  for (let i = 0; i < 10_000; i++, baseCalls++) sink += plain(mix[baseCalls % MIX_SIZE]).vf;
  baseElapsed = performance.now() - baseStart;
}
const basePerSecond = (baseCalls / baseElapsed) * 1000;

const times = new Float64Array(LATENCY_CALLS);
for (let i = 0; i < LATENCY_CALLS; i++) {
  const t0 = process.hrtime.bigint();
  sink += adaptRecipe(mix[i % MIX_SIZE]).chipLoadMm;
  times[i] = Number(process.hrtime.bigint() - t0) / 1000;
}
times.sort();
const pct = (p: number) => times[Math.min(times.length - 1, Math.floor(p * times.length))];

const verdict = perSecond >= TARGET_PER_SECOND ? "PASS" : "BELOW";
console.log(`adaptRecipe benchmark (node ${process.version}, one core, ${MIX_SIZE} seeded inputs)`);
console.log(`  throughput: ${Math.round(perSecond).toLocaleString("en-US")} adaptations/s over ${calls.toLocaleString("en-US")} calls`);
console.log(
  `  baseline:   ${Math.round(basePerSecond).toLocaleString("en-US")} plain speed-and-feed evaluations/s on the same mix; adaptRecipe costs ${(basePerSecond / perSecond).toFixed(1)}× one`,
);
console.log(`  per call:   p50 ${pct(0.5).toFixed(2)} µs, p99 ${pct(0.99).toFixed(2)} µs`);
console.log(`  target:     ≥ ${TARGET_PER_SECOND.toLocaleString("en-US")}/s: ${verdict}`);
if (!Number.isFinite(sink)) console.log("  (checksum not finite)");
