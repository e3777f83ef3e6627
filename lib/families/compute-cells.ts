import type { CellWarning, FamilyRules } from "@/content-schema/family";
import type { Cutter, MachineClass, Material } from "@/lib/catalogue/catalogue-types";

import { cellWarnings } from "./cell-warnings";
import { deriveCellOperations, type CellCatalogue, type CellOperation } from "./derive-cell";

// Pure: every cell of a family under one rules version. Preview and generation both call this, so what the
// engineer saw is what gets written.

export type ComputedCell = CellCatalogue & { key: string; operations: CellOperation[]; warnings: CellWarning[] };

export const cellKey = (cutterId: string, materialId: string, machineClassId: string) => `${cutterId}:${materialId}:${machineClassId}`;

export function computeCell(cell: CellCatalogue, rules: FamilyRules): ComputedCell {
  const operations = deriveCellOperations(cell, rules);
  return {
    ...cell,
    key: cellKey(cell.cutter.id, cell.material.id, cell.machineClass.id),
    operations,
    warnings: cellWarnings(cell, operations),
  };
}

/** Cells in a stable order: material, machine class, cutter. */
export function* eachCell({
  cutters,
  materials,
  machineClasses,
}: {
  cutters: Cutter[];
  materials: Material[];
  machineClasses: MachineClass[];
}): Generator<CellCatalogue> {
  for (const material of materials)
    for (const machineClass of machineClasses) for (const cutter of cutters) yield { cutter, material, machineClass };
}

export const cellCount = (c: { cutters: unknown[]; materials: unknown[]; machineClasses: unknown[] }) =>
  c.cutters.length * c.materials.length * c.machineClasses.length;
