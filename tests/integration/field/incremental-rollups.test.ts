import { afterAll, describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { refreshFieldRollups } from "@/lib/field/refresh-rollups";
import { getBoss } from "@/lib/jobs/boss";
import { createBenchSheet, supersede } from "@/tests/factories/bench";
import { reportOutcomes } from "@/tests/factories/field";
import { createVendorWithStaff } from "@/tests/factories/foundation";

afterAll(async () => {
  await (await getBoss()).stop({ graceful: false, wait: true });
});

const snapshot = async (vendorId: string) => ({
  versions: await db("field_version_rollups").where({ vendor_id: vendorId }).orderBy("sheet_version_id").select("*"),
  changes: await db("field_change_rollups")
    .where({ vendor_id: vendorId })
    .orderBy(["sheet_version_id", "operation_index", "param"])
    .select("*"),
  weeks: await db("field_week_rollups").where({ vendor_id: vendorId }).orderBy(["sheet_version_id", "week"]).select("*"),
});

describe("incremental Field-results rollups", () => {
  it("recomputes only the versions a write touched, with the numbers a full rebuild gives", async () => {
    const { vendor } = await createVendorWithStaff();
    const first = await createBenchSheet(vendor.id);
    const second = await createBenchSheet(vendor.id);
    await reportOutcomes(vendor.id, first.versionId, { asWritten: 3, afterChanges: 2, failed: { chatter: 1 } }, [
      { feedMmMin: { from: 1000, to: 800 } },
      { rpm: { from: 18000, to: 16000 } },
    ]);
    await reportOutcomes(vendor.id, second.versionId, { failed: { broken_tool: 2 } });
    await refreshFieldRollups();

    // One new report: one version recomputed, however many others exist.
    await reportOutcomes(vendor.id, second.versionId, { asWritten: 1 });
    const { versions } = await refreshFieldRollups();
    expect(versions).toBe(1);
    expect(
      await db("field_version_rollups").where({ sheet_version_id: second.versionId }).first("outcomes", "failed", "worked_as_written"),
    ).toEqual({ outcomes: 3, failed: 2, worked_as_written: 1 });

    // Deletes and state changes reach the rollup too.
    await db("outcomes").where({ sheet_version_id: first.versionId, result: "failed" }).delete();
    await supersede(vendor.id, first.sheetId);
    expect((await refreshFieldRollups()).versions).toBeGreaterThanOrEqual(1);
    const incremental = await snapshot(vendor.id);
    expect(incremental.versions.find((r) => r.sheet_version_id === first.versionId)).toMatchObject({
      failed: 0,
      chatter: 0,
      outcomes: 5,
      state: "superseded",
    });

    await refreshFieldRollups(db, { rebuild: true });
    expect(await snapshot(vendor.id)).toEqual(incremental);
    expect((await refreshFieldRollups()).versions).toBe(0);
  });
});
