import { describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { countSheetView, flushSheetViews } from "@/lib/field/count-sheet-view";
import { createBenchSheet } from "@/tests/factories/bench";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { mustExist } from "@/tests/support/must-exist";

const viewsOf = async (versionId: string) =>
  (await db("sheet_version_activity").where({ sheet_version_id: versionId }).sum<{ views: string | null }[]>("views as views"))[0].views;

describe("Library page views counted in memory", () => {
  it("are written together, added to the day's count, and only for the vendor's readable versions", async () => {
    const a = await createVendorWithStaff();
    const b = await createVendorWithStaff();
    const sheetA = await createBenchSheet(a.vendor.id);
    const sheetB = await createBenchSheet(b.vendor.id);
    await db("sheet_versions").insert({
      vendor_id: b.vendor.id,
      sheet_id: sheetB.sheetId,
      number: 2,
      state: "draft",
      title: "Draft",
      source: "x",
      front_matter: "{}",
    });
    const draft = mustExist(await db("sheet_versions").where({ sheet_id: sheetB.sheetId, number: 2 }).first("id"), "draft");

    for (let i = 0; i < 5; i++) countSheetView(a.vendor.id, sheetA.versionId);
    countSheetView(b.vendor.id, sheetB.versionId);
    countSheetView(a.vendor.id, sheetB.versionId); // another vendor's version
    countSheetView(b.vendor.id, draft.id); // not readable
    countSheetView(a.vendor.id, "not-a-uuid");
    // Nothing is written before the flush: a view costs the reader no round trip.
    expect(await viewsOf(sheetA.versionId)).toBeNull();
    await flushSheetViews();
    expect(Number(await viewsOf(sheetA.versionId))).toBe(5);
    expect(Number(await viewsOf(sheetB.versionId))).toBe(1);
    expect(await viewsOf(draft.id)).toBeNull();

    countSheetView(a.vendor.id, sheetA.versionId);
    countSheetView(a.vendor.id, sheetA.versionId);
    await flushSheetViews();
    expect(Number(await viewsOf(sheetA.versionId))).toBe(7);
    expect(
      await db("sheet_version_activity").where({ sheet_version_id: sheetA.versionId }).count<{ count: string }[]>("* as count"),
    ).toEqual([{ count: "1" }]);
  });
});
