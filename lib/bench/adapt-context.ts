import type { AdaptInput, AdaptResult, MachineInput, OperationKind, OverridesInput, ToolMaterial } from "@/lib/machining";
import { adaptRecipe } from "@/lib/machining";

// Pure: runs in the browser (adapt panel) and on the server (saving a setup, alerts, PDFs).

/** One operation of a sheet version in metric machining units, as the engine needs it. */
export type ContextOperation = {
  index: number;
  label: string;
  kind: OperationKind;
  rpm: number;
  feedMmMin: number;
  axialDepthMm: number;
  radialDepthMm: number;
  plungeFeedMmMin: number | null;
};

/** Everything a sheet version contributes to an adaptation; serialisable, passed to the client panel. */
export type AdaptContext = {
  versionId: string;
  versionNumber: number;
  versionState: string;
  sheetSlug: string;
  title: string;
  cutter: { sku: string; name: string; diameterMm: number; flutes: number; cornerRadiusMm: number | null; toolMaterial: ToolMaterial };
  material: { name: string; vcMinMpm: number; vcMaxMpm: number; minChipLoadMm: number; kcNmm2: number };
  referenceMachine: { name: string; rigidity: number; rpmMin: number; rpmMax: number };
  operations: ContextOperation[];
  cautions: { kind: string; text: string }[];
};

/** A machine as the engine sees it, plus the usual stick-out (a default for the override). */
export type BenchMachineInput = MachineInput & { stickoutMm?: number | null };

export function buildAdaptInput(context: AdaptContext, operationIndex: number, machine: BenchMachineInput, overrides: OverridesInput = {}): AdaptInput {
  const op = context.operations[operationIndex];
  if (!op) throw new RangeError(`The sheet has no operation ${operationIndex + 1}.`);
  const { stickoutMm, ...engineMachine } = machine;
  return {
    operation: {
      kind: op.kind,
      diameterMm: context.cutter.diameterMm,
      flutes: context.cutter.flutes,
      rpm: op.rpm,
      feedMmMin: op.feedMmMin,
      axialDepthMm: op.axialDepthMm,
      radialDepthMm: op.radialDepthMm,
      plungeFeedMmMin: op.plungeFeedMmMin ?? undefined,
      cornerRadiusMm: context.cutter.cornerRadiusMm ?? undefined,
    },
    material: {
      cuttingSpeedWindowMpm: [context.material.vcMinMpm, context.material.vcMaxMpm],
      minChipLoadMm: context.material.minChipLoadMm,
      specificCuttingForceNmm2: context.material.kcNmm2,
    },
    referenceMachine: { rigidity: context.referenceMachine.rigidity },
    machine: engineMachine,
    overrides: {
      radialDepthMm: overrides.radialDepthMm,
      axialDepthMm: overrides.axialDepthMm,
      stickoutMm: overrides.stickoutMm ?? stickoutMm ?? undefined,
    },
    options: { toolMaterial: context.cutter.toolMaterial },
  };
}

/** adaptRecipe over one operation of a context; throws MachiningInputError for impossible input. */
export const adaptOperation = (context: AdaptContext, operationIndex: number, machine: BenchMachineInput, overrides: OverridesInput = {}): AdaptResult =>
  adaptRecipe(buildAdaptInput(context, operationIndex, machine, overrides));
