import { isMachiningInputError, type AdaptResult, type EntryCapability, type OverridesInput, type UnitSystem } from "@/lib/machining";

import { adaptOperation, type AdaptContext, type BenchMachineInput } from "./adapt-context";
import { diffAdapted, type AdaptedChange } from "./adapted-diff";

// Pure: the one rule for carrying a setup from a sheet version to a newer one. Used by the Bench's
// old-beside-new view (`readapt-setup.ts`) and by the change-alert e-mails (`send-change-alerts.ts`).

/** The new version's operation for an old one: same kind and label, else the same position if the kind matches. */
export function matchOperation(oldContext: AdaptContext, newContext: AdaptContext, index: number): number | null {
  const old = oldContext.operations[index];
  if (!old) return null;
  const same = newContext.operations.find((op) => op.kind === old.kind && op.label === old.label);
  return same?.index ?? (newContext.operations[index]?.kind === old.kind ? index : null);
}

export type ReadaptedOperation = { operationIndex: number; result: AdaptResult | null; error: string | null; changes: AdaptedChange[] };

type Options = {
  oldContext: AdaptContext;
  newContext: AdaptContext;
  operationIndex: number;
  machine: BenchMachineInput;
  setup: { overrides: OverridesInput; entryCapability: EntryCapability; units: UnitSystem };
  /** What the changes are measured against; by default the old version adapted again on the same machine, so the diff shows the sheet's change and nothing else. */
  baseline?: AdaptResult;
};

/** The setup's operation adapted on the newer version, or null when the operation is no longer there. */
export function readaptOperation({ oldContext, newContext, operationIndex, machine, setup, baseline }: Options): ReadaptedOperation | null {
  const index = matchOperation(oldContext, newContext, operationIndex);
  if (index === null) return null;
  const options = { entryCapability: setup.entryCapability, units: setup.units };
  try {
    const result = adaptOperation(newContext, index, machine, setup.overrides, options);
    const before = baseline ?? adaptOperation(oldContext, operationIndex, machine, setup.overrides, options);
    return { operationIndex: index, result, error: null, changes: diffAdapted(before, result) };
  } catch (error) {
    if (!isMachiningInputError(error)) throw error;
    return { operationIndex: index, result: null, error: error.message, changes: [] };
  }
}
