import "server-only";

import type { Knex } from "knex";

import type { CutterSelection } from "@/content-schema/family";
import { rowToCutter, rowToMachineClass, rowToMaterial } from "@/lib/catalogue/catalogue-rows";
import type { Cutter, MachineClass, Material } from "@/lib/catalogue/catalogue-types";
import { db } from "@/lib/db/knex";

import type { Family } from "./family-rows";

/** The vendor's cutters a selection picks (all its filters together), by SKU. */
export async function listSelectedCutters({
  vendorId,
  selection,
  trx = db,
}: {
  vendorId: string;
  selection: CutterSelection;
  trx?: Knex;
}): Promise<Cutter[]> {
  const q = trx("cutters").where({ vendor_id: vendorId });
  if (selection.series)
    q.whereRaw("lower(sku) like ? escape '\\'", [`${selection.series.toLowerCase().replace(/[\\%_]/g, (c) => `\\${c}`)}%`]);
  if (selection.geometries.length) q.whereIn("geometry", selection.geometries);
  if (selection.diameterMinMm !== undefined) q.where("diameter_mm", ">=", selection.diameterMinMm);
  if (selection.diameterMaxMm !== undefined) q.where("diameter_mm", "<=", selection.diameterMaxMm);
  if (selection.skus.length) q.whereRaw("lower(sku) = any(?)", [selection.skus.map((s) => s.toLowerCase())]);
  return (await q.orderBy("sku")).map(rowToCutter);
}

export type FamilyCatalogue = { cutters: Cutter[]; materials: Material[]; machineClasses: MachineClass[] };

export async function getFamilyCatalogue({
  vendorId,
  family,
  trx = db,
}: {
  vendorId: string;
  family: Family;
  trx?: Knex;
}): Promise<FamilyCatalogue> {
  const cutters = await listSelectedCutters({ vendorId, selection: family.cutters, trx });
  const materials = (await trx("materials").where({ vendor_id: vendorId }).whereIn("id", family.materialIds).orderBy("name")).map(
    rowToMaterial,
  );
  const machineClasses = (
    await trx("machine_classes").where({ vendor_id: vendorId }).whereIn("id", family.machineClassIds).orderBy("rpm_max")
  ).map(rowToMachineClass);
  return { cutters, materials, machineClasses };
}
