import "server-only";

import { db } from "@/lib/db/knex";

import { rowToCutter, rowToMachineClass, rowToMaterial } from "./catalogue-rows";
import type { Cutter, MachineClass, Material } from "./catalogue-types";

export async function listCutters({ vendorId }: { vendorId: string }): Promise<Cutter[]> {
  return (await db("cutters").where({ vendor_id: vendorId }).orderBy("sku")).map(rowToCutter);
}

export async function listMaterials({ vendorId }: { vendorId: string }): Promise<Material[]> {
  return (await db("materials").where({ vendor_id: vendorId }).orderBy("name")).map(rowToMaterial);
}

export async function listMachineClasses({ vendorId }: { vendorId: string }): Promise<MachineClass[]> {
  return (await db("machine_classes").where({ vendor_id: vendorId }).orderBy("rpm_max")).map(rowToMachineClass);
}
