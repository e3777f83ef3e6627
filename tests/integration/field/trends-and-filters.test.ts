import { afterAll, describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { listNeedsAttention } from "@/lib/field/needs-attention";
import { refreshFieldRollups } from "@/lib/field/refresh-rollups";
import { findFieldSheet } from "@/lib/field/sheet-field-results";
import { getSheetTrends } from "@/lib/field/sheet-trends";
import { weekStartOf } from "@/lib/field/week-series";
import { wilsonInterval } from "@/lib/field/wilson";
import { getBoss } from "@/lib/jobs/boss";
import { createBenchSheet, supersede } from "@/tests/factories/bench";
import { reportOutcomes } from "@/tests/factories/field";
import { createVendorWithStaff } from "@/tests/factories/foundation";

const Z95 = 1.959964;
const at = (iso: string) => new Date(iso);

afterAll(async () => {
  await (await getBoss()).stop({ graceful: false, wait: true });
});

describe("Field-results trends per sheet", () => {
  it("counts reports and failures week by week (Monday to Sunday, UTC) across the sheet's versions, publications marked", async () => {
    const { vendor } = await createVendorWithStaff();
    const sheet = await createBenchSheet(vendor.id);
    // Week of Mon 2 Nov 2026: 4 reports, 1 failed (Monday 00:00 and Sunday 23:59 both inside it).
    await reportOutcomes(vendor.id, sheet.versionId, { asWritten: 3 }, undefined, { at: at("2026-11-02T00:00:00Z") });
    await reportOutcomes(vendor.id, sheet.versionId, { failed: { chatter: 1 } }, undefined, { at: at("2026-11-08T23:59:00Z") });
    // Week of Mon 9 Nov: nothing. Week of Mon 16 Nov: 5 reports on v1, 2 failed.
    await reportOutcomes(vendor.id, sheet.versionId, { asWritten: 1, afterChanges: 2, failed: { poor_finish: 2 } }, undefined, {
      at: at("2026-11-18T10:00:00Z"),
    });
    const event = await supersede(vendor.id, sheet.sheetId);
    // The same week, on v2: 3 more reports, none failed. Outside the range: one report in October.
    await reportOutcomes(vendor.id, event.versionId, { asWritten: 3 }, undefined, { at: at("2026-11-20T10:00:00Z") });
    await reportOutcomes(vendor.id, sheet.versionId, { failed: { chatter: 1 } }, undefined, { at: at("2026-10-20T10:00:00Z") });
    await refreshFieldRollups();

    const trends = await getSheetTrends({ vendorId: vendor.id, sheetId: sheet.sheetId, from: "2026-11-04", to: "2026-11-22", z: Z95 });
    expect(trends.weeks.map((w) => [w.week, w.outcomes, w.failed])).toEqual([
      ["2026-11-02", 4, 1],
      ["2026-11-09", 0, 0],
      ["2026-11-16", 8, 2],
    ]);
    expect(trends.weeks[2].failure).toEqual(wilsonInterval(2, 8, Z95));
    // Both versions were published when the factory ran (published versions are immutable): their week is marked.
    expect(trends.weeks.some((w) => w.published.length)).toBe(false);
    const today = new Date().toISOString().slice(0, 10);
    const upToNow = await getSheetTrends({
      vendorId: vendor.id,
      sheetId: sheet.sheetId,
      from: "2026-11-02",
      to: today > "2026-11-02" ? today : "2026-11-02",
      z: Z95,
    });
    const marked = upToNow.weeks.filter((w) => w.published.length);
    expect(marked.map((w) => w.week)).toEqual([weekStartOf(new Date())]);
    expect(marked[0].published).toEqual([1, 2]);
    // The weekly rollup equals a count over the raw reports.
    const raw = await db("outcomes")
      .where({ vendor_id: vendor.id })
      .whereIn("sheet_version_id", [sheet.versionId, event.versionId])
      .where("created_at", ">=", "2026-11-16")
      .where("created_at", "<", "2026-11-23")
      .count<{ count: string }[]>("* as count");
    expect(trends.weeks[2].outcomes).toBe(Number(raw[0].count));
  });

  it("keeps the weekly rollup up to date incrementally, like the other rollups", async () => {
    const { vendor } = await createVendorWithStaff();
    const sheet = await createBenchSheet(vendor.id);
    await reportOutcomes(vendor.id, sheet.versionId, { asWritten: 2 }, undefined, { at: at("2026-11-03T10:00:00Z") });
    await refreshFieldRollups();
    await reportOutcomes(vendor.id, sheet.versionId, { failed: { broken_tool: 1 } }, undefined, { at: at("2026-11-04T10:00:00Z") });
    await refreshFieldRollups();
    expect(await db("field_week_rollups").where({ vendor_id: vendor.id }).select("outcomes", "failed", "broken_tool")).toEqual([
      { outcomes: 3, failed: 1, broken_tool: 1 },
    ]);
    await db("outcomes").where({ vendor_id: vendor.id, result: "failed" }).delete();
    await refreshFieldRollups();
    expect(await db("field_week_rollups").where({ vendor_id: vendor.id }).select("outcomes", "failed")).toEqual([
      { outcomes: 2, failed: 0 },
    ]);
  });

  it("shows nothing of another vendor's sheet: not found, and no weeks", async () => {
    const a = await createVendorWithStaff();
    const b = await createVendorWithStaff();
    const sheetB = await createBenchSheet(b.vendor.id);
    await reportOutcomes(b.vendor.id, sheetB.versionId, { failed: { chatter: 4 } }, undefined, { at: at("2026-11-03T10:00:00Z") });
    await refreshFieldRollups();
    expect(await findFieldSheet({ vendorId: a.vendor.id, slug: sheetB.sheetSlug })).toBeNull();
    const trends = await getSheetTrends({ vendorId: a.vendor.id, sheetId: sheetB.sheetId, from: "2026-11-01", to: "2026-11-10", z: Z95 });
    expect(trends.weeks.every((w) => w.outcomes === 0)).toBe(true);
    expect(trends.publications).toEqual([]);
  });
});

describe("Needs attention, filtered", () => {
  async function twoSheets() {
    const { vendor } = await createVendorWithStaff();
    const early = await createBenchSheet(vendor.id);
    const late = await createBenchSheet(vendor.id);
    // early: fails a lot in October, fine in November. late: fails in November only.
    await reportOutcomes(vendor.id, early.versionId, { failed: { chatter: 8 }, asWritten: 2 }, undefined, {
      at: at("2026-10-14T10:00:00Z"),
    });
    await reportOutcomes(vendor.id, early.versionId, { asWritten: 6 }, undefined, { at: at("2026-11-11T10:00:00Z") });
    await reportOutcomes(vendor.id, late.versionId, { failed: { melting_welding: 3 }, asWritten: 3 }, undefined, {
      at: at("2026-11-12T10:00:00Z"),
    });
    await refreshFieldRollups();
    const classOf = async (sheetId: string) =>
      (await db("sheets as s").join("machine_classes as mc", "mc.id", "s.machine_class_id").where("s.id", sheetId).first("mc.slug"))
        .slug as string;
    return { vendor, early, late, classOf };
  }

  it("counts only the reports of the weeks a date range touches", async () => {
    const { vendor, early, late } = await twoSheets();
    const all = await listNeedsAttention({ vendorId: vendor.id, z: Z95 });
    expect(all.map((i) => i.versionId)).toEqual([early.versionId, late.versionId]);
    const november = await listNeedsAttention({ vendorId: vendor.id, z: Z95, filters: { from: "2026-11-01", to: "2026-11-30" } });
    expect(november.map((i) => [i.versionId, i.failed, i.outcomes, i.symptoms.melting_welding])).toEqual([[late.versionId, 3, 6, 3]]);
    expect(november[0].lowerBound).toBeCloseTo(wilsonInterval(3, 6, Z95).lower, 10);
    const october = await listNeedsAttention({ vendorId: vendor.id, z: Z95, filters: { to: "2026-10-31" } });
    expect(october.map((i) => [i.versionId, i.failed, i.outcomes])).toEqual([[early.versionId, 8, 10]]);
    // A Wednesday-to-Wednesday range counts the whole weeks it touches.
    const week = await listNeedsAttention({ vendorId: vendor.id, z: Z95, filters: { from: "2026-11-11", to: "2026-11-11" } });
    expect(week.map((i) => i.versionId)).toEqual([late.versionId]);
  });

  it("filters by machine class, alone or with dates, and never shows another vendor's versions", async () => {
    const { vendor, early, late, classOf } = await twoSheets();
    expect(
      (await listNeedsAttention({ vendorId: vendor.id, z: Z95, filters: { machineClass: await classOf(late.sheetId) } })).map(
        (i) => i.versionId,
      ),
    ).toEqual([late.versionId]);
    expect(
      await listNeedsAttention({
        vendorId: vendor.id,
        z: Z95,
        filters: { machineClass: await classOf(early.sheetId), from: "2026-11-01" },
      }),
    ).toEqual([]);
    expect(await listNeedsAttention({ vendorId: vendor.id, z: Z95, filters: { machineClass: "no-such-class" } })).toEqual([]);
    const other = await createVendorWithStaff();
    expect(await listNeedsAttention({ vendorId: other.vendor.id, z: Z95, filters: { from: "2026-01-01", to: "2026-12-31" } })).toEqual([]);
  });
});
