import "server-only";

import { db } from "@/lib/db/knex";
import { type AdaptResult, isMachiningInputError } from "@/lib/machining";

import { adaptOperation, type AdaptContext } from "./adapt-context";
import { type AdaptedChange, diffAdapted } from "./adapted-diff";
import type { SetupSummary } from "./list-setups";
import { loadAdaptContext } from "./load-adapt-context";
import { machineToInput } from "./machine-rows";
import { getMachine } from "./machines";

export type Readaptation = {
  context: AdaptContext;
  operationIndex: number | null;
  result: AdaptResult | null;
  error: string | null;
  changes: AdaptedChange[];
};

/** The setup recomputed on the sheet's current published version, for an old-beside-new view. Nothing is saved. */
export async function readaptSetup({ vendorId, userId, setup, oldContext }: { vendorId: string; userId: string; setup: SetupSummary; oldContext: AdaptContext }): Promise<Readaptation | null> {
  if (!setup.newerVersionNumber) return null;
  const current = await db("sheet_versions as v")
    .join("sheet_versions as pinned", "pinned.sheet_id", "v.sheet_id")
    .where({ "pinned.id": setup.sheetVersionId, "pinned.vendor_id": vendorId, "v.vendor_id": vendorId, "v.state": "published" })
    .first("v.id");
  const [context, machine] = await Promise.all([current ? loadAdaptContext({ vendorId, versionId: current.id }) : null, getMachine({ vendorId, userId, machineId: setup.machineId })]);
  if (!context || !machine) return null;
  const old = oldContext.operations[setup.operationIndex];
  const match = context.operations.find((op) => op.kind === old?.kind && op.label === old?.label) ?? (context.operations[setup.operationIndex]?.kind === old?.kind ? context.operations[setup.operationIndex] : undefined);
  if (!match) return { context, operationIndex: null, result: null, error: "This operation is no longer on the current version.", changes: [] };
  try {
    const result = adaptOperation(context, match.index, machineToInput(machine), setup.overrides, { entryCapability: setup.entryCapability, units: setup.units });
    return { context, operationIndex: match.index, result, error: null, changes: diffAdapted(setup.result, result) };
  } catch (error) {
    if (!isMachiningInputError(error)) throw error;
    return { context, operationIndex: match.index, result: null, error: error.message, changes: [] };
  }
}
