import "server-only";

import { type MachineFields } from "@/content-schema/machine-fields";
import { rigidityFactor } from "@/content-schema/machine-rigidity";
import { writeAudit } from "@/lib/audit/write-audit";
import { db } from "@/lib/db/knex";
import { NotFound } from "@/lib/errors/domain-errors";
import { drainUploadDeletions, queueUploadDeletions } from "@/lib/storage/cleanup-uploads";

import { MACHINE_COLUMNS, rowToMachine, type Machine } from "./machine-rows";

type Owner = { vendorId: string; userId: string };

// Every query carries vendor AND user: a machine of another customer or vendor is simply not found.
const owned = ({ vendorId, userId }: Owner) => db("machines").where({ vendor_id: vendorId, user_id: userId });

export async function listMachines(owner: Owner): Promise<Machine[]> {
  return (
    await owned(owner)
      .orderBy("name")
      .select(...MACHINE_COLUMNS)
  ).map(rowToMachine);
}

export async function findMachine(owner: Owner & { machineId: string }): Promise<Machine | null> {
  const row = await owned(owner)
    .andWhere({ id: owner.machineId })
    .first(...MACHINE_COLUMNS);
  return row ? rowToMachine(row) : null;
}

const toRow = (f: MachineFields) => ({
  name: f.name,
  preset: f.preset ?? null,
  rpm_min: f.rpmMin,
  rpm_max: f.rpmMax,
  power_kw: f.powerKw,
  max_feed_mm_min: f.maxFeedMmMin,
  rigidity: rigidityFactor(f.rigidity),
  z_thrust_n: f.zThrustN ?? null,
  spindle_kind: f.spindleKind,
  rated_rpm: f.ratedRpm ?? null,
  stickout_mm: f.stickoutMm ?? null,
  units: f.units,
});

export async function createMachine({ vendorId, userId, fields }: Owner & { fields: MachineFields }): Promise<Machine> {
  const [row] = await db("machines")
    .insert({ vendor_id: vendorId, user_id: userId, ...toRow(fields) })
    .returning([...MACHINE_COLUMNS]);
  await writeAudit({
    vendorId,
    actorUserId: userId,
    action: "machine.create",
    objectType: "machine",
    objectId: row.id,
    details: { name: fields.name },
  });
  return rowToMachine(row);
}

export async function updateMachine({
  vendorId,
  userId,
  machineId,
  fields,
}: Owner & { machineId: string; fields: MachineFields }): Promise<Machine> {
  const [row] = await owned({ vendorId, userId })
    .andWhere({ id: machineId })
    .update({ ...toRow(fields), updated_at: db.fn.now() })
    .returning([...MACHINE_COLUMNS]);
  if (!row) throw new NotFound("That machine was not found.");
  await writeAudit({
    vendorId,
    actorUserId: userId,
    action: "machine.update",
    objectType: "machine",
    objectId: machineId,
    details: { name: fields.name },
  });
  return rowToMachine(row);
}

/** Deleting a machine deletes its setups (and their outcomes) too: the numbers were for that machine. */
/** Outcome photos go with it: their files are marked for deletion in the same transaction. */
export async function deleteMachine({ vendorId, userId, machineId }: Owner & { machineId: string }): Promise<void> {
  const photoKeys = await db.transaction(async (trx) => {
    const keys: string[] = await trx("outcomes as o")
      .join("setups as s", "s.id", "o.setup_id")
      .where({ "s.vendor_id": vendorId, "s.user_id": userId, "s.machine_id": machineId, "o.vendor_id": vendorId })
      .whereNotNull("o.photo_key")
      .pluck("o.photo_key");
    const count = await trx("machines").where({ vendor_id: vendorId, user_id: userId, id: machineId }).delete();
    if (!count) throw new NotFound("That machine was not found.");
    await queueUploadDeletions(trx, keys);
    await writeAudit(
      { vendorId, actorUserId: userId, action: "machine.delete", objectType: "machine", objectId: machineId, details: {} },
      trx,
    );
    return keys;
  });
  // Right away when storage answers; the hourly cleanup retries what it did not.
  if (photoKeys.length)
    await drainUploadDeletions({ keys: photoKeys }).catch((error: unknown) => console.warn("[uploads] photo deletion deferred", error));
}
