import type { Cutter, MachineClass, Material } from "@/lib/catalogue/catalogue-types";
import { adaptRecipe } from "@/lib/machining";
import { deriveOperation } from "@/lib/sheets/derive-starting-data";

// The engine's own answer for one cell, computed here without the family code: the derived operation for the
// rule's numbers, and adaptRecipe's warnings for it on the cell's machine class (cutter out by its flute length).

export function engineOperation(
  cutter: Cutter,
  material: Material,
  k: MachineClass,
  kind: "slotting" | "profile",
  rule: { apPerD?: number } = {},
) {
  return deriveOperation({ cutter, material, machine: k, kind, rule });
}

export function engineWarnings(cutter: Cutter, material: Material, k: MachineClass, op: ReturnType<typeof engineOperation>): string[] {
  const d = op.derived;
  const result = adaptRecipe({
    operation: {
      kind: op.kind,
      diameterMm: cutter.diameterMm,
      flutes: cutter.flutes,
      rpm: d.rpm,
      feedMmMin: d.feedMmMin,
      axialDepthMm: d.apMm,
      radialDepthMm: d.aeMm,
      plungeFeedMmMin: d.plungeFeedMmMin ?? undefined,
      cornerForm: cutter.cornerForm,
      fluteLengthMm: cutter.fluteLengthMm,
      entry: op.entry === "helical" ? "helix" : op.entry === "ramp" || op.entry === "plunge" ? op.entry : undefined,
      rampAngleDeg: op.rampAngleDeg,
    },
    material: {
      cuttingSpeedWindowMpm: [material.vcMinMpm, material.vcMaxMpm],
      minChipLoadMm: material.minChipLoadMm,
      specificCuttingForceNmm2: material.kcNmm2,
      chipLoadPctOfD: { min: material.chipLoadMinPctD / 100, max: material.chipLoadMaxPctD / 100 },
      meltsWhenRubbing: true,
    },
    referenceMachine: { rigidity: k.rigidity, zThrustN: k.zThrustN, maxFeedMmMin: k.maxFeedMmMin, maxRpm: k.rpmMax },
    machine: {
      minRpm: k.rpmMin,
      maxRpm: k.rpmMax,
      spindlePowerKw: k.powerKw,
      maxFeedMmMin: k.maxFeedMmMin,
      rigidity: k.rigidity,
      zThrustN: k.zThrustN,
      spindleKind: k.spindleKind,
      ratedRpm: k.ratedRpm,
    },
    overrides: { stickoutMm: cutter.fluteLengthMm },
    options: { toolMaterial: cutter.toolMaterial },
    entryCapability: "helix",
  });
  return result.warnings.map((w) => w.code).filter((c) => c !== "standard-cautions" && c !== "values-adapted");
}
