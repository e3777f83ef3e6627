import type { CellWarning } from "@/content-schema/family";
import { adaptOperation, type AdaptContext } from "@/lib/adapt/adapt-context";
import { toContextOperation } from "@/lib/adapt/read-front-matter";
import { isMachiningInputError } from "@/lib/machining";

import type { CellCatalogue, CellOperation } from "./derive-cell";

// Pure: what the engine says about a cell's operations on the cell's own machine class (the reference machine as
// the customer's, the cutter out by its flute length, a CAM that can helix): any warning blocks the cell.

/** Notices every adaptation carries; they say nothing about the numbers. */
const NOTICES = new Set(["standard-cautions", "values-adapted"]);

export function cellContext({ cutter, material, machineClass }: CellCatalogue, operations: CellOperation[]): AdaptContext {
  const d = cutter.diameterMm;
  return {
    versionId: "00000000-0000-4000-8000-000000000000",
    versionNumber: 0,
    versionState: "draft",
    sheetSlug: "preview",
    title: "preview",
    cutter: {
      sku: cutter.sku,
      name: cutter.name,
      diameterMm: d,
      flutes: cutter.flutes,
      cornerForm: cutter.cornerForm,
      cornerRadiusMm: cutter.cornerForm === "ball" ? d / 2 : (cutter.cornerRadiusMm ?? null),
      fluteLengthMm: cutter.fluteLengthMm,
      toolMaterial: cutter.toolMaterial,
    },
    material: {
      name: material.name,
      vcMinMpm: material.vcMinMpm,
      vcMaxMpm: material.vcMaxMpm,
      minChipLoadMm: material.minChipLoadMm,
      kcNmm2: material.kcNmm2,
      chipLoadMinPctD: material.chipLoadMinPctD,
      chipLoadMaxPctD: material.chipLoadMaxPctD,
      kc11Nmm2: material.kc11Nmm2 ?? null,
      mc: material.mc ?? null,
      meltsWhenRubbing: material.cautions.some((c) => c.kind === "melting"),
    },
    referenceMachine: {
      name: machineClass.name,
      rigidity: machineClass.rigidity,
      rpmMin: machineClass.rpmMin,
      rpmMax: machineClass.rpmMax,
      maxFeedMmMin: machineClass.maxFeedMmMin,
      zThrustN: machineClass.zThrustN ?? null,
    },
    operations: operations.map((op, i) => toContextOperation(op.operation, i, d)),
    cautions: [],
  };
}

export function cellWarnings(cell: CellCatalogue, operations: CellOperation[]): CellWarning[] {
  const context = cellContext(cell, operations);
  const { machineClass: k, cutter } = cell;
  const machine = {
    minRpm: k.rpmMin,
    maxRpm: k.rpmMax,
    spindlePowerKw: k.powerKw,
    maxFeedMmMin: k.maxFeedMmMin,
    rigidity: k.rigidity,
    zThrustN: k.zThrustN,
    spindleKind: k.spindleKind,
    ratedRpm: k.ratedRpm,
    stickoutMm: cutter.fluteLengthMm,
  };
  return context.operations.flatMap((op) => {
    try {
      const result = adaptOperation(context, op.index, machine, {}, { entryCapability: "helix" });
      return result.warnings.filter((w) => !NOTICES.has(w.code)).map((w) => ({ operation: op.label, code: w.code, message: w.message }));
    } catch (error) {
      if (!isMachiningInputError(error)) throw error;
      return [{ operation: op.label, code: "refused", message: error.message }];
    }
  });
}
