import { describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { addMyCutter, hasMyCutter, listMyCutters, removeMyCutter } from "@/lib/my-cutters/my-cutters";
import { createBenchSheet } from "@/tests/factories/bench";
import { createMember, createVendorWithStaff } from "@/tests/factories/foundation";

describe("my cutters", () => {
  it("adds a cutter by its SKU in any case, once however often it is added, and removes it", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const sheet = await createBenchSheet(vendor.id);
    const owner = { vendorId: vendor.id, userId: customer.user.id };
    expect(await addMyCutter({ ...owner, sku: ` ${sheet.cutterSku.toLowerCase()} ` })).toMatchObject({ sku: sheet.cutterSku, added: true });
    expect(await addMyCutter({ ...owner, sku: sheet.cutterSku })).toMatchObject({ added: false });
    const list = await listMyCutters(owner);
    expect(list.map((c) => c.sku)).toEqual([sheet.cutterSku]);
    expect(list[0]).toMatchObject({ diameterMm: 3.175, flutes: 1 });
    await removeMyCutter({ ...owner, cutterId: list[0].id });
    await removeMyCutter({ ...owner, cutterId: list[0].id });
    expect(await listMyCutters(owner)).toEqual([]);
  });

  it("refuses an unknown SKU and another vendor's SKU with a clear message", async () => {
    const a = await createVendorWithStaff();
    const b = await createVendorWithStaff();
    const sheetOfB = await createBenchSheet(b.vendor.id);
    await expect(addMyCutter({ vendorId: a.vendor.id, userId: a.customer.user.id, sku: "NO-SUCH" })).rejects.toThrow(
      "No cutter has the SKU NO-SUCH.",
    );
    await expect(addMyCutter({ vendorId: a.vendor.id, userId: a.customer.user.id, sku: sheetOfB.cutterSku })).rejects.toMatchObject({
      code: "not_found",
    });
    expect(await db("customer_cutters").where({ user_id: a.customer.user.id })).toEqual([]);
  });

  it("keeps each customer's list to themselves, per vendor", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const other = await createMember(vendor.id, "customer");
    const second = await createVendorWithStaff();
    const sheet = await createBenchSheet(vendor.id);
    const mine = await addMyCutter({ vendorId: vendor.id, userId: customer.user.id, sku: sheet.cutterSku });
    expect(await listMyCutters({ vendorId: vendor.id, userId: other.user.id })).toEqual([]);
    expect(await listMyCutters({ vendorId: second.vendor.id, userId: customer.user.id })).toEqual([]);
    expect(await hasMyCutter({ vendorId: vendor.id, userId: other.user.id, cutterId: mine.id })).toBe(false);
    // Another customer's remove does not touch my list.
    await removeMyCutter({ vendorId: vendor.id, userId: other.user.id, cutterId: mine.id });
    expect(await hasMyCutter({ vendorId: vendor.id, userId: customer.user.id, cutterId: mine.id })).toBe(true);
  });
});
