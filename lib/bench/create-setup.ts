import "server-only";

import type { SetupCreate } from "@/content-schema/setup-fields";
import { adaptOperation } from "@/lib/adapt/adapt-context";
import { findVersionAdaptContext } from "@/lib/adapt/find-version-adapt-context";
import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { InvalidInput } from "@/lib/errors/domain-errors";
import { isMachiningInputError } from "@/lib/machining";

import { machineToInput } from "./machine-rows";
import { findMachine } from "./machines";

const invalid = (field: string, message: string) => new InvalidInput("Please correct the marked fields.", { [field]: [message] });

/**
 * Saves a sheet version adapted to one of the customer's machines, pinned to that version.
 * The numbers are recomputed here from the stored sheet and machine: the client's are never trusted.
 */
export async function createSetup({ vendorId, userId, input }: { vendorId: string; userId: string; input: SetupCreate }) {
  const [context, machine] = await Promise.all([
    findVersionAdaptContext({ vendorId, versionId: input.versionId }),
    findMachine({ vendorId, userId, machineId: input.machineId }),
  ]);
  if (!context || context.versionState === "withdrawn") throw invalid("versionId", "That sheet version is not available.");
  if (!machine) throw invalid("machineId", "Choose one of your machines.");
  if (!context.operations[input.operationIndex]) throw invalid("operationIndex", "The sheet has no such operation.");
  const overrides = { radialDepthMm: input.radialDepthMm, axialDepthMm: input.axialDepthMm, stickoutMm: input.stickoutMm };
  let result;
  try {
    result = adaptOperation(context, input.operationIndex, machineToInput(machine), overrides, {
      entryCapability: input.entryCapability,
      units: input.units,
    });
  } catch (error) {
    if (!isMachiningInputError(error)) throw error;
    const field = error.field.startsWith("overrides.radial")
      ? "radialDepthMm"
      : error.field.startsWith("overrides.axial")
        ? "axialDepthMm"
        : error.field.startsWith("overrides.stick")
          ? "stickoutMm"
          : "machineId";
    throw invalid(field, error.message);
  }
  const op = context.operations[input.operationIndex];
  const name = input.name || `${context.title}: ${op.label} on ${machine.name}`;
  const [row] = await db("setups")
    .insert({
      vendor_id: vendorId,
      user_id: userId,
      machine_id: machine.id,
      sheet_version_id: context.versionId,
      operation_index: input.operationIndex,
      name: name.slice(0, 200),
      overrides: JSON.stringify(Object.fromEntries(Object.entries(overrides).filter(([, v]) => v !== undefined))),
      result: JSON.stringify(result),
      units: input.units,
      entry_capability: input.entryCapability,
    })
    .returning(["id"]);
  await writeAudit({
    vendorId,
    actorUserId: userId,
    action: "setup.create",
    objectType: "setup",
    objectId: row.id,
    details: { sheetVersionId: context.versionId, machineId: machine.id, entryCapability: input.entryCapability },
  });
  return { id: row.id as string, result };
}
