import { MachiningInputError } from "../errors";
import type { AdaptInput, AdaptResult } from "../types";
import { resolveInput } from "./resolve-input";
import { referenceChipLoad } from "./rules/01-reference-chip-load";
import { engagement } from "./rules/02-engagement";
import { entryCapability } from "./rules/03-entry-capability";
import { spindleSpeedRange } from "./rules/04-spindle-speed-range";
import { feedLimit } from "./rules/05-feed-limit";
import { chipLoadBand } from "./rules/06-chip-load-band";
import { cuttingSpeedWindow } from "./rules/07-cutting-speed-window";
import { rigidity } from "./rules/08-rigidity";
import { spindlePower } from "./rules/09-spindle-power";
import { toolDeflection } from "./rules/10-tool-deflection";
import { plungeFeed } from "./rules/11-plunge-feed";
import { sanityLimits } from "./rules/12-sanity-limits";
import { standardCautions } from "./rules/13-standard-cautions";
import { createState, type AdaptState } from "./state";

/** The thirteen rules of lib/machining/README.md, in order. */
export const RULE_PIPELINE = [
  referenceChipLoad,
  engagement,
  entryCapability,
  spindleSpeedRange,
  feedLimit,
  chipLoadBand,
  cuttingSpeedWindow,
  rigidity,
  spindlePower,
  toolDeflection,
  plungeFeed,
  sanityLimits,
  standardCautions,
] as const;

const finite = (v: number | null) => v === null || Number.isFinite(v);

// Written out rather than looped over keys: this runs on every call and stays monomorphic.
const allFinite = (r: AdaptResult) =>
  finite(r.rpm) &&
  finite(r.feedMmMin) &&
  finite(r.chipLoadMm) &&
  finite(r.maxChipThicknessMm) &&
  finite(r.cuttingSpeedMpm) &&
  finite(r.axialDepthMm) &&
  finite(r.radialDepthMm) &&
  finite(r.plungeFeedMmMin) &&
  finite(r.mrrCm3Min) &&
  finite(r.powerKw) &&
  finite(r.torqueNm) &&
  finite(r.forceN) &&
  finite(r.deflectionMm) &&
  finite(r.meanChipThicknessMm) &&
  finite(r.effectiveDiameterMm) &&
  finite(r.peakForceN) &&
  finite(r.availablePowerKw) &&
  finite(r.plungeThrustN) &&
  finite(r.plungeFeedPerRevMm) &&
  stepsFinite(r.steps);

function stepsFinite(steps: AdaptResult["steps"]): boolean {
  for (const step of steps) if (!Number.isFinite(step.before) || !Number.isFinite(step.after)) return false;
  return true;
}

/** Adapts one sheet operation to a customer's machine; every change is explained in `steps`. */
export function adaptRecipe(input: AdaptInput): AdaptResult {
  const s = createState(resolveInput(input));
  // RULE_PIPELINE, called by name: one call site per rule lets each be inlined, where a loop over the
  // list makes one call site with thirteen targets.
  referenceChipLoad(s);
  engagement(s);
  entryCapability(s);
  spindleSpeedRange(s);
  feedLimit(s);
  chipLoadBand(s);
  cuttingSpeedWindow(s);
  rigidity(s);
  spindlePower(s);
  toolDeflection(s);
  plungeFeed(s);
  sanityLimits(s);
  standardCautions(s);
  return finish(s);
}

function finish(s: AdaptState): AdaptResult {
  const result: AdaptResult = {
    rpm: s.rpm,
    feedMmMin: s.feedMmMin,
    chipLoadMm: s.chipLoadMm,
    maxChipThicknessMm: s.maxChipThicknessMm,
    cuttingSpeedMpm: s.cuttingSpeedMpm,
    axialDepthMm: s.axialDepthMm,
    radialDepthMm: s.radialDepthMm,
    plungeFeedMmMin: s.plungeFeedMmMin,
    mrrCm3Min: (s.axialDepthMm * s.radialDepthMm * s.feedMmMin) / 1000,
    powerKw: s.powerKw,
    torqueNm: s.torqueNm,
    forceN: s.forceN,
    deflectionMm: s.deflectionMm,
    meanChipThicknessMm: s.meanChipThicknessMm,
    effectiveDiameterMm: s.effectiveDiameterMm,
    peakForceN: s.peakForceN,
    availablePowerKw: s.availablePowerKw,
    plungeThrustN: s.plungeThrustN,
    plungeFeedPerRevMm: s.plungeFeedPerRevMm,
    warnings: s.warnings,
    steps: s.steps,
  };
  if (!allFinite(result)) {
    throw new MachiningInputError("operation", "The inputs are out of range: the result cannot be computed.");
  }
  return result;
}
