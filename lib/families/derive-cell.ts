import type { FamilyRules } from "@/content-schema/family";
import { operationKindLabels } from "@/content-schema/sheet-kinds";
import { sheetOperationSchema, type SheetOperation } from "@/content-schema/sheet-operation";
import type { Cutter, MachineClass, Material } from "@/lib/catalogue/catalogue-types";
import { deriveOperation, type DerivedOperation } from "@/lib/sheets/derive-starting-data";

import { resolveRule } from "./resolve-rule";

// Pure: one cell of a family (cutter × material × machine class): the operations the engine derives under the
// family's rules, each with the rules that set its numbers.

export type CellCatalogue = { cutter: Cutter; material: Material; machineClass: MachineClass };
export type CellOperation = { derived: DerivedOperation; operation: SheetOperation; rules: string[] };

/** The front matter strings of a derived operation, as a sheet holds them. */
export function operationFields({ derived: _numbers, ...op }: DerivedOperation) {
  return Object.fromEntries(Object.entries(op).filter(([, v]) => v !== undefined));
}

export function deriveCellOperations({ cutter, material, machineClass }: CellCatalogue, rules: FamilyRules): CellOperation[] {
  return rules.kinds.map((kind) => {
    const { rule, keys } = resolveRule(rules, { materialGroup: material.materialGroup, machineClassSlug: machineClass.slug, kind });
    const derived = deriveOperation({
      cutter,
      material,
      machine: machineClass,
      kind,
      label: operationKindLabels[kind],
      vcFraction: rule.vcPosition,
      rule: {
        chipLoadPosition: rule.chipLoadPosition,
        apPerD: rule.apPerD,
        aePerD: rule.aePerD,
        entry: rule.entry,
        rampAngleDeg: rule.rampAngleDeg,
      },
    });
    return { derived, operation: sheetOperationSchema.parse(operationFields(derived)), rules: keys };
  });
}
