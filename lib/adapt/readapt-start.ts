import "server-only";

import { findSetup } from "@/lib/bench/list-setups";
import { isUuid } from "@/lib/ids/is-uuid";

import type { OverrideDraft } from "./compute-adaptation";
import { findVersionAdaptContext } from "./find-version-adapt-context";

export type AdaptStart = { machineId: string; operationIndex: number; overrides: OverrideDraft };

const mm = (value: number | undefined) => (value === undefined ? "" : `${Number(value.toFixed(4))} mm`);

/**
 * Where "Adapt version N" starts from a saved setup: the same machine, the matching operation and the
 * customer's own changes, so re-adapting never silently drops them. Another customer's setup is ignored.
 */
export async function readaptStart({
  vendorId,
  userId,
  setupId,
  versionId,
}: {
  vendorId: string;
  userId: string;
  setupId: string | undefined;
  versionId: string;
}): Promise<AdaptStart | null> {
  if (!setupId || !isUuid(setupId)) return null;
  const setup = await findSetup({ vendorId, userId, setupId });
  if (!setup) return null;
  const [oldContext, context] = await Promise.all([
    findVersionAdaptContext({ vendorId, versionId: setup.sheetVersionId }),
    findVersionAdaptContext({ vendorId, versionId }),
  ]);
  if (!oldContext || !context) return null;
  const old = oldContext.operations[setup.operationIndex];
  const match =
    context.operations.find((op) => op.kind === old?.kind && op.label === old?.label) ?? context.operations[setup.operationIndex];
  return {
    machineId: setup.machineId,
    operationIndex: match?.index ?? 0,
    overrides: { ae: mm(setup.overrides.radialDepthMm), ap: mm(setup.overrides.axialDepthMm), stickout: mm(setup.overrides.stickoutMm) },
  };
}
