import { afterAll, describe, expect, it } from "vitest";

import { adaptOperation } from "@/lib/adapt/adapt-context";
import { findVersionAdaptContext } from "@/lib/adapt/find-version-adapt-context";
import { db } from "@/lib/db/knex";
import { getBoss } from "@/lib/jobs/boss";
import { runSeeds } from "@/seeds/run-seeds";
import { mustExist } from "@/tests/support/must-exist";

afterAll(async () => {
  await (await getBoss()).stop({ graceful: false, wait: true });
});

// The demo holds one family and its batch history; no generated demo sheet shows a number the engine warns about.
describe("demo family (invented demo data)", () => {
  it("has a published first batch, a second batch in review, and engine-clean published sheets", async () => {
    await runSeeds(db, { reset: true });
    const family = mustExist(await db("families").where({ slug: "o-flute-finishers" }).first(), "demo family");
    const batches = await db("family_batches").where({ family_id: family.id }).orderBy("number").select("id", "state");
    expect(batches.map((b) => b.state)).toEqual(["published", "in_review"]);
    const outcomes = await db("family_batch_items").where({ batch_id: batches[0].id }).pluck("outcome");
    expect(outcomes).toContain("created");
    const second = await db("family_batch_items").where({ batch_id: batches[1].id }).pluck("outcome");
    expect(second).toContain("new-version");

    const published = await db("family_batch_items as i")
      .join("sheet_versions as v", "v.id", "i.version_id")
      .where({ "i.batch_id": batches[0].id, "v.state": "published" })
      .select("v.id", "i.machine_class_id");
    expect(published.length).toBeGreaterThan(4);
    for (const { id, machine_class_id } of published) {
      const context = (await findVersionAdaptContext({ vendorId: family.vendor_id, versionId: id }))!;
      const k = mustExist(await db("machine_classes").where({ id: machine_class_id }).first(), "k");
      const machine = {
        minRpm: k.rpm_min,
        maxRpm: k.rpm_max,
        spindlePowerKw: k.power_kw,
        maxFeedMmMin: k.max_feed_mm_min,
        rigidity: k.rigidity,
        zThrustN: k.z_thrust_n ?? undefined,
        spindleKind: k.spindle_kind,
        ratedRpm: k.rated_rpm ?? undefined,
        stickoutMm: context.cutter.fluteLengthMm,
      };
      for (const op of context.operations) {
        const codes = adaptOperation(context, op.index, machine, {}, { entryCapability: "helix" })
          .warnings.map((w) => w.code)
          .filter((c) => c !== "standard-cautions" && c !== "values-adapted");
        expect(codes, `${context.sheetSlug} ${op.label}`).toEqual([]);
      }
    }
  });
});
