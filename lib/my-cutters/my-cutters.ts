import "server-only";

import { findCutterBySku } from "@/lib/catalogue/find-catalogue-item";
import { db } from "@/lib/db/knex";
import { NotFound } from "@/lib/errors/domain-errors";

type Owner = { vendorId: string; userId: string };
export type MyCutter = { id: string; sku: string; name: string; diameterMm: number; flutes: number; addedAt: Date };

// Every query carries vendor AND user: another customer's or vendor's list is simply not there.
const owned = ({ vendorId, userId }: Owner) => db("customer_cutters").where({ vendor_id: vendorId, user_id: userId });

export async function listMyCutters(owner: Owner): Promise<MyCutter[]> {
  const rows = await db("customer_cutters as cc")
    .join("cutters as c", function () {
      this.on("c.id", "cc.cutter_id").andOn("c.vendor_id", "cc.vendor_id");
    })
    .where({ "cc.vendor_id": owner.vendorId, "cc.user_id": owner.userId })
    .orderBy([{ column: "c.diameter_mm" }, { column: "c.sku" }])
    .select("c.id", "c.sku", "c.name", "c.diameter_mm", "c.flutes", "cc.created_at");
  return rows.map((r) => ({
    id: r.id,
    sku: r.sku,
    name: r.name,
    diameterMm: Number(r.diameter_mm),
    flutes: Number(r.flutes),
    addedAt: r.created_at,
  }));
}

export async function hasMyCutter(owner: Owner & { cutterId: string }): Promise<boolean> {
  return Boolean(await owned(owner).andWhere({ cutter_id: owner.cutterId }).first("cutter_id"));
}

/** Adds the vendor's cutter with this SKU (any case) to the customer's cutters; adding it again changes nothing. */
export async function addMyCutter({
  vendorId,
  userId,
  sku,
}: Owner & { sku: string }): Promise<{ id: string; sku: string; added: boolean }> {
  const cutter = await findCutterBySku({ vendorId, sku: sku.trim() });
  if (!cutter) throw new NotFound(`No cutter has the SKU ${sku.trim()}.`);
  const inserted = await db("customer_cutters")
    .insert({ vendor_id: vendorId, user_id: userId, cutter_id: cutter.id })
    .onConflict(["vendor_id", "user_id", "cutter_id"])
    .ignore()
    .returning("cutter_id");
  return { id: cutter.id, sku: cutter.sku, added: inserted.length > 0 };
}

/** Removing a cutter that is not (or no longer) on the list is not an error: the end state is the same. */
export async function removeMyCutter(owner: Owner & { cutterId: string }): Promise<void> {
  await owned(owner).andWhere({ cutter_id: owner.cutterId }).delete();
}
