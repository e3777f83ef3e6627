import "server-only";

import type { SetupSummary } from "@/lib/bench/list-setups";
import { machineToInput } from "@/lib/bench/machine-rows";
import { findMachine } from "@/lib/bench/machines";
import { db } from "@/lib/db/knex";
import type { AdaptResult } from "@/lib/machining";

import type { AdaptContext } from "./adapt-context";
import type { AdaptedChange } from "./adapted-diff";
import { findVersionAdaptContext } from "./find-version-adapt-context";
import { readaptOperation } from "./readapt-operation";

export type Readaptation = {
  context: AdaptContext;
  operationIndex: number | null;
  result: AdaptResult | null;
  error: string | null;
  changes: AdaptedChange[];
};

/** The setup recomputed on the sheet's current published version, for an old-beside-new view. Nothing is saved. */
export async function readaptSetup({
  vendorId,
  userId,
  setup,
  oldContext,
}: {
  vendorId: string;
  userId: string;
  setup: SetupSummary;
  oldContext: AdaptContext;
}): Promise<Readaptation | null> {
  if (!setup.newerVersionNumber) return null;
  const current = await db("sheet_versions as v")
    .join("sheet_versions as pinned", "pinned.sheet_id", "v.sheet_id")
    .where({ "pinned.id": setup.sheetVersionId, "pinned.vendor_id": vendorId, "v.vendor_id": vendorId, "v.state": "published" })
    .first("v.id");
  const [context, machine] = await Promise.all([
    current ? findVersionAdaptContext({ vendorId, versionId: current.id }) : null,
    findMachine({ vendorId, userId, machineId: setup.machineId }),
  ]);
  if (!context || !machine) return null;
  const readapted = readaptOperation({
    oldContext,
    newContext: context,
    operationIndex: setup.operationIndex,
    machine: machineToInput(machine),
    setup,
    baseline: setup.result,
  });
  if (!readapted)
    return { context, operationIndex: null, result: null, error: "This operation is no longer on the current version.", changes: [] };
  return { context, ...readapted };
}
