import "server-only";

import type { Knex } from "knex";

import { db } from "@/lib/db/knex";

import { rowToCutter, rowToMachineClass, rowToMaterial } from "./catalogue-rows";
import type { Cutter, MachineClass, Material } from "./catalogue-types";

type By = { vendorId: string; trx?: Knex };

export async function findCutterBySku({ vendorId, sku, trx = db }: By & { sku: string }): Promise<Cutter | null> {
  const row = await trx("cutters").where({ vendor_id: vendorId }).whereRaw("lower(sku) = lower(?)", [sku]).first();
  return row ? rowToCutter(row) : null;
}

export async function findCutterById({ vendorId, id, trx = db }: By & { id: string }): Promise<Cutter | null> {
  const row = await trx("cutters").where({ vendor_id: vendorId, id }).first();
  return row ? rowToCutter(row) : null;
}

export async function findMaterialBySlug({ vendorId, slug, trx = db }: By & { slug: string }): Promise<Material | null> {
  const row = await trx("materials").where({ vendor_id: vendorId, slug }).first();
  return row ? rowToMaterial(row) : null;
}

export async function findMaterialById({ vendorId, id, trx = db }: By & { id: string }): Promise<Material | null> {
  const row = await trx("materials").where({ vendor_id: vendorId, id }).first();
  return row ? rowToMaterial(row) : null;
}

export async function findMachineClassBySlug({ vendorId, slug, trx = db }: By & { slug: string }): Promise<MachineClass | null> {
  const row = await trx("machine_classes").where({ vendor_id: vendorId, slug }).first();
  return row ? rowToMachineClass(row) : null;
}

export async function findMachineClassById({ vendorId, id, trx = db }: By & { id: string }): Promise<MachineClass | null> {
  const row = await trx("machine_classes").where({ vendor_id: vendorId, id }).first();
  return row ? rowToMachineClass(row) : null;
}
