import { describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { findShopFilter, listMyCutterSheets } from "@/lib/my-cutters/list-shop-sheets";
import { addMyCutter } from "@/lib/my-cutters/my-cutters";
import { listPublishedSheets } from "@/lib/sheets/list-published-sheets";
import { createBenchSheet } from "@/tests/factories/bench";
import { createVendorWithStaff, uniq } from "@/tests/factories/foundation";
import { createMachine } from "@/tests/factories/tickets";
import { mustExist } from "@/tests/support/must-exist";

// Invented demo data. The bench sheet's class is a rigid router (8000–24 000 rpm, 2.2 kW, rigidity 0.8); a second sheet
// of the same cutter is for a hobby router (10 000–24 000 rpm, 0.8 kW, rigidity 0.4). A 24 000 rpm, 0.8 kW, 0.4 machine
// fits only the hobby class (2.2 kW is more than twice its power); a 24 000 rpm, 2.2 kW, 0.8 machine only the rigid one.
async function shop() {
  const { vendor, customer } = await createVendorWithStaff();
  const acrylic = await createBenchSheet(vendor.id);
  const otherCutter = await createBenchSheet(vendor.id);
  const cutter = mustExist(await db("cutters").where({ vendor_id: vendor.id, sku: acrylic.cutterSku }).first("id"), "cutter");
  const material = mustExist(await db("sheets").where({ id: acrylic.sheetId }).first("material_id"), "material");
  const [hobby] = await db("machine_classes")
    .insert({
      vendor_id: vendor.id,
      slug: uniq("hobby"),
      name: "Hobby router",
      rpm_min: 10000,
      rpm_max: 24000,
      power_kw: 0.8,
      max_feed_mm_min: 4000,
      rigidity: 0.4,
    })
    .returning("id");
  const [hobbySheet] = await db("sheets")
    .insert({
      vendor_id: vendor.id,
      slug: uniq("hobby-sheet"),
      cutter_id: cutter.id,
      material_id: material.material_id,
      machine_class_id: hobby.id,
    })
    .returning(["id", "slug"]);
  const v1 = mustExist(await db("sheet_versions").where({ id: acrylic.versionId }).first(), "v1");
  await db("sheet_versions").insert({
    vendor_id: vendor.id,
    sheet_id: hobbySheet.id,
    number: 1,
    state: "published",
    title: "Hobby version",
    source: v1.source,
    front_matter: JSON.stringify(v1.front_matter),
    published_at: db.fn.now(),
  });
  return { vendor, owner: { vendorId: vendor.id, userId: customer.user.id }, acrylic, otherCutter, hobbySheet };
}

describe("fits my shop", () => {
  it("lists for each of my cutters the sheets that fit each of my machines", async () => {
    const { owner, acrylic, hobbySheet } = await shop();
    await addMyCutter({ ...owner, sku: acrylic.cutterSku });
    const small = await createMachine(owner.vendorId, owner.userId, {
      name: "Small router",
      rpm_min: 10000,
      rpm_max: 24000,
      power_kw: 0.8,
      rigidity: 0.4,
    });
    const big = await createMachine(owner.vendorId, owner.userId, {
      name: "Big router",
      rpm_min: 8000,
      rpm_max: 24000,
      power_kw: 2.2,
      rigidity: 0.8,
    });
    const [row] = await listMyCutterSheets(owner);
    expect(row.cutter.sku).toBe(acrylic.cutterSku);
    const on = (id: string) => row.machines.find((m) => m.machine.id === id)?.sheets.map((s) => s.slug);
    expect(on(small.id)).toEqual([hobbySheet.slug]);
    expect(on(big.id)).toEqual([acrylic.sheetSlug]);
  });

  it("filters the Library to my cutters × my machines' classes; nothing without cutters or machines", async () => {
    const { owner, acrylic, hobbySheet } = await shop();
    const all = await listPublishedSheets({ vendorId: owner.vendorId });
    expect(all).toHaveLength(3);
    const empty = await findShopFilter(owner);
    expect(empty).toMatchObject({ cutters: 0, machines: 0 });
    expect(
      await listPublishedSheets({
        vendorId: owner.vendorId,
        filters: { cutterIds: empty.cutterIds, machineClassIds: empty.machineClassIds },
      }),
    ).toEqual([]);
    await addMyCutter({ ...owner, sku: acrylic.cutterSku });
    await createMachine(owner.vendorId, owner.userId, {
      name: "Small router",
      rpm_min: 10000,
      rpm_max: 24000,
      power_kw: 0.8,
      rigidity: 0.4,
    });
    const filter = await findShopFilter(owner);
    const fits = await listPublishedSheets({
      vendorId: owner.vendorId,
      filters: { cutterIds: filter.cutterIds, machineClassIds: filter.machineClassIds },
    });
    // The other cutter's sheet and the rigid router's sheet are left out.
    expect(fits.map((s) => s.slug)).toEqual([hobbySheet.slug]);
  });
});
