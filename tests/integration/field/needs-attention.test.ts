import { afterAll, describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { listCustomerChanges } from "@/lib/field/customer-changes";
import { listNeedsAttention } from "@/lib/field/needs-attention";
import { refreshFieldRollups } from "@/lib/field/refresh-rollups";
import { wilsonInterval } from "@/lib/field/wilson";
import { WILSON_LOWER_SQL } from "@/lib/field/wilson-sql";
import { getBoss } from "@/lib/jobs/boss";
import { createBenchSheet } from "@/tests/factories/bench";
import { reportOutcomes } from "@/tests/factories/field";
import { createVendorWithStaff } from "@/tests/factories/foundation";

const Z95 = 1.959964;

afterAll(async () => {
  await (await getBoss()).stop({ graceful: false, wait: true });
});

describe("Needs attention", () => {
  it("ranks by the lower Wilson bound: 30 failures in 100 reports outrank 1 in 1 and 2 in 3", async () => {
    const { vendor } = await createVendorWithStaff();
    const many = await createBenchSheet(vendor.id);
    const once = await createBenchSheet(vendor.id);
    const few = await createBenchSheet(vendor.id);
    const clean = await createBenchSheet(vendor.id);
    await reportOutcomes(vendor.id, many.versionId, { asWritten: 70, failed: { chatter: 30 } });
    await reportOutcomes(vendor.id, once.versionId, { failed: { broken_tool: 1 } });
    await reportOutcomes(vendor.id, few.versionId, { asWritten: 1, failed: { poor_finish: 2 } });
    await reportOutcomes(vendor.id, clean.versionId, { asWritten: 9 });
    await refreshFieldRollups();

    const list = await listNeedsAttention({ vendorId: vendor.id, z: Z95 });
    // Raw shares would put 1/1 (100 %) and 2/3 (67 %) first; their lower bounds are 0.21 and 0.21, 30/100's is 0.22.
    expect(list.map((i) => i.versionId)).toEqual([many.versionId, few.versionId, once.versionId]);
    expect(list[0].failure.lower).toBeCloseTo(wilsonInterval(30, 100, Z95).lower, 10);
    expect(list.find((i) => i.versionId === clean.versionId)).toBeUndefined();
    // At 99 % the small samples fall further behind.
    const strict = await listNeedsAttention({ vendorId: vendor.id, z: 2.575829 });
    expect(strict[0].versionId).toBe(many.versionId);
    expect(strict[0].failure.lower).toBeLessThan(list[0].failure.lower);
  });

  it("computes the same lower bound in SQL as wilsonInterval() does", async () => {
    const cases = [
      [0, 1],
      [1, 1],
      [1, 29],
      [15, 148],
      [81, 263],
      [5, 5],
      [499, 1000],
      [1, 100000],
    ];
    for (const z of [1.644854, Z95, 2.575829]) {
      for (const [failed, outcomes] of cases) {
        const { rows } = await db.raw(
          `select ${WILSON_LOWER_SQL} as lower from (select ?::int as failed, ?::int as outcomes) r cross join (select ?::float8 as z) zz`,
          [failed, outcomes, z],
        );
        expect(Number(rows[0].lower)).toBeCloseTo(wilsonInterval(failed, outcomes, z).lower, 12);
      }
    }
  });

  it("aggregates what customers changed: median and spread of the relative change per parameter", async () => {
    const { vendor } = await createVendorWithStaff();
    const sheet = await createBenchSheet(vendor.id);
    // Feed lowered by 10, 20, 20, 30 and 40 % → median −20 %, quartiles −30 % and −20 % (linear interpolation).
    const feeds = [900, 800, 800, 700, 600].map((to) => ({ feedMmMin: { from: 1000, to } }));
    await reportOutcomes(vendor.id, sheet.versionId, { afterChanges: 5, failed: { chatter: 1 } }, [
      ...feeds.slice(0, 4),
      { feedMmMin: { from: 1000, to: 600 }, rpm: { from: 18000, to: 19800 } },
    ]);
    await refreshFieldRollups();
    const changes = await listCustomerChanges({ vendorId: vendor.id, minReports: 1 });
    const feed = changes.find((c) => c.param === "feedMmMin")!;
    expect(feed).toMatchObject({ reports: 5, lowered: 5, raised: 0 });
    expect(feed.medianPct).toBeCloseTo(-20, 9);
    expect(feed.q1Pct).toBeCloseTo(-30, 9);
    expect(feed.q3Pct).toBeCloseTo(-20, 9);
    const rpm = changes.find((c) => c.param === "rpm")!;
    expect(rpm).toMatchObject({ reports: 1, raised: 1 });
    expect(rpm.medianPct).toBeCloseTo(10, 9);
    // The vendor-wide list leaves out a parameter only one report changed.
    expect((await listCustomerChanges({ vendorId: vendor.id })).map((c) => c.param)).toEqual(["feedMmMin"]);
  });
});
