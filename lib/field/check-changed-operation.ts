import "server-only";

import type { Knex } from "knex";

import { changeableParamLabels } from "@/content-schema/outcome-fields";
import type { SheetOperation } from "@/content-schema/sheet-front-matter";
import { adaptRecipe, isMachiningInputError, WARNING_CODES } from "@/lib/machining";
import { show } from "@/lib/machining/validate";
import { toAdaptInput, type CutterRow, type MachineClassRow, type MachineRow, type MaterialRow } from "@/lib/tickets/card-input";

const labels: Record<string, string> = changeableParamLabels;
const labelOf = (field: string) => labels[field] ?? field;

// Notices every adaptation carries; they say nothing about the numbers.
const NOTICES = new Set(["standard-cautions", "values-adapted"]);

type ClassRow = MachineClassRow & MachineRow & { name: string };

/**
 * The engine's warnings, and the numbers it would change, for one operation of a sheet on the sheet's own reference machine class (the cutter out of
 * the collet by its flute length), as sentences; an input the engine refuses is one sentence too.
 */
export async function checkChangedOperation({
  trx,
  vendorId,
  sheet,
  op,
}: {
  trx: Knex;
  vendorId: string;
  sheet: { cutterId: string; materialId: string; machineClassId: string };
  op: SheetOperation;
}) {
  const cutter = await trx("cutters").where({ vendor_id: vendorId, id: sheet.cutterId }).first<CutterRow>();
  const material = await trx("materials").where({ vendor_id: vendorId, id: sheet.materialId }).first<MaterialRow>();
  const machineClass = await trx("machine_classes").where({ vendor_id: vendorId, id: sheet.machineClassId }).first<ClassRow>();
  if (!cutter || !material || !machineClass)
    return {
      referenceMachine: "the reference machine",
      warnings: ["The sheet's catalogue entries could not be read; check the draft in the editor."],
    };
  const machine: MachineRow = { ...machineClass, stickout_mm: cutter.flute_length_mm, units: "metric" };
  const referenceMachine = `the ${machineClass.name} reference machine`;
  try {
    // As the demo sheets are checked: a CAM that can ramp and helix, so only the numbers are judged.
    const result = adaptRecipe({ ...toAdaptInput(op, cutter, material, machineClass, machine), entryCapability: "helix" });
    const warnings = result.warnings
      .filter((w) => !NOTICES.has(w.code))
      .map((w) => `${WARNING_CODES[w.code]?.title ?? w.code}: ${w.message}`);
    // On its own reference machine the engine should keep the sheet's numbers; where a rule after the first
    // (the reference chip load) changes one, the sheet states a number the engine would not run.
    const adjusted = [
      ...new Set(
        result.steps
          .filter((step) => step.rule !== "reference-chip-load")
          .map((step) => `The engine would change ${labelOf(step.field)} ${show(step.before)} → ${show(step.after)}: ${step.why}`),
      ),
    ];
    return { referenceMachine, warnings: [...warnings, ...adjusted] };
  } catch (error) {
    if (!isMachiningInputError(error)) throw error;
    return { referenceMachine, warnings: [`The engine refuses these numbers: ${error.message}`] };
  }
}
