import {
  adaptRecipe,
  type AdaptInput,
  type AdaptResult,
  type CornerForm,
  type EntryCapability,
  type EntryKind,
  type MachineInput,
  type OperationKind,
  type OverridesInput,
  type ToolMaterial,
  type UnitSystem,
} from "@/lib/machining";

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
  /** How the sheet enters the material; null where it does not say (pre-drilled, from the side). */
  entry: EntryKind | null;
  rampAngleDeg: number | null;
};

/** Everything a sheet version contributes to an adaptation; serialisable, passed to the client panel. */
export type AdaptContext = {
  versionId: string;
  versionNumber: number;
  versionState: string;
  sheetSlug: string;
  title: string;
  cutter: {
    sku: string;
    name: string;
    diameterMm: number;
    flutes: number;
    cornerRadiusMm: number | null;
    cornerForm: CornerForm;
    fluteLengthMm: number | null;
    toolMaterial: ToolMaterial;
  };
  material: {
    name: string;
    vcMinMpm: number;
    vcMaxMpm: number;
    minChipLoadMm: number;
    kcNmm2: number;
    /** The chip-load band per tooth, in % of D. */
    chipLoadMinPctD: number;
    chipLoadMaxPctD: number;
    kc11Nmm2: number | null;
    mc: number | null;
    /** A plastic that melts and welds the chip when the edge rubs (it carries a melting caution). */
    meltsWhenRubbing: boolean;
  };
  referenceMachine: { name: string; rigidity: number; rpmMin: number; rpmMax: number; maxFeedMmMin: number; zThrustN: number | null };
  operations: ContextOperation[];
  cautions: { kind: string; text: string }[];
};

/** A machine as the engine sees it, plus the usual stick-out (a default for the override). */
export type BenchMachineInput = MachineInput & { stickoutMm?: number | null };

/** What the customer chose beside the machine: their CAM's entry capability and the units of messages. */
export type AdaptChoices = { entryCapability?: EntryCapability; units?: UnitSystem };

export function buildAdaptInput(
  context: AdaptContext,
  operationIndex: number,
  machine: BenchMachineInput,
  overrides: OverridesInput = {},
  choices: AdaptChoices = {},
): AdaptInput {
  const op = context.operations[operationIndex];
  if (!op) throw new RangeError(`The sheet has no operation ${operationIndex + 1}.`);
  const { stickoutMm, ...engineMachine } = machine;
  const { material, referenceMachine: ref, cutter } = context;
  return {
    operation: {
      kind: op.kind,
      diameterMm: cutter.diameterMm,
      flutes: cutter.flutes,
      rpm: op.rpm,
      feedMmMin: op.feedMmMin,
      axialDepthMm: op.axialDepthMm,
      radialDepthMm: op.radialDepthMm,
      plungeFeedMmMin: op.plungeFeedMmMin ?? undefined,
      cornerRadiusMm: cutter.cornerRadiusMm ?? undefined,
      cornerForm: cutter.cornerForm,
      fluteLengthMm: cutter.fluteLengthMm ?? undefined,
      entry: op.entry ?? undefined,
      rampAngleDeg: op.rampAngleDeg ?? undefined,
    },
    material: {
      cuttingSpeedWindowMpm: [material.vcMinMpm, material.vcMaxMpm],
      minChipLoadMm: material.minChipLoadMm,
      specificCuttingForceNmm2: material.kcNmm2,
      chipLoadPctOfD: { min: material.chipLoadMinPctD / 100, max: material.chipLoadMaxPctD / 100 },
      kc11Nmm2: material.kc11Nmm2 ?? undefined,
      mc: material.mc ?? undefined,
      meltsWhenRubbing: material.meltsWhenRubbing,
    },
    referenceMachine: { rigidity: ref.rigidity, zThrustN: ref.zThrustN ?? undefined, maxFeedMmMin: ref.maxFeedMmMin, maxRpm: ref.rpmMax },
    machine: engineMachine,
    overrides: {
      radialDepthMm: overrides.radialDepthMm,
      axialDepthMm: overrides.axialDepthMm,
      stickoutMm: overrides.stickoutMm ?? stickoutMm ?? undefined,
    },
    options: { toolMaterial: cutter.toolMaterial, messageUnits: choices.units },
    entryCapability: choices.entryCapability,
  };
}

/** adaptRecipe over one operation of a context; throws MachiningInputError for impossible input. */
export const adaptOperation = (
  context: AdaptContext,
  operationIndex: number,
  machine: BenchMachineInput,
  overrides: OverridesInput = {},
  choices: AdaptChoices = {},
): AdaptResult => adaptRecipe(buildAdaptInput(context, operationIndex, machine, overrides, choices));
