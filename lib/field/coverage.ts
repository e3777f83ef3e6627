import "server-only";

import { readDb } from "@/lib/db/read-db";

import { findCoverageGaps, type CoverageReport } from "./coverage-gaps";

/**
 * Customers' registered machines against the machine classes the vendor publishes sheets for.
 * Machines are read grouped by their numbers, never one by one, and no name or owner leaves the database.
 */
export async function getCoverageGaps({ vendorId }: { vendorId: string }): Promise<CoverageReport> {
  const db = await readDb();
  const [classes, machines] = await Promise.all([
    db("machine_classes as mc")
      .where("mc.vendor_id", vendorId)
      .whereExists((q) =>
        q
          .select(db.raw("1"))
          .from("sheets as s")
          .join("sheet_versions as v", function () {
            this.on("v.sheet_id", "s.id").andOn("v.vendor_id", "s.vendor_id");
          })
          .whereRaw("s.machine_class_id = mc.id and s.vendor_id = mc.vendor_id")
          .where("v.state", "published"),
      )
      .orderBy("mc.name")
      .select("mc.slug", "mc.name", "mc.rpm_min", "mc.rpm_max", "mc.power_kw", "mc.rigidity"),
    db("machines as m")
      .join("members as mb", function () {
        this.on("mb.user_id", "m.user_id").andOn("mb.vendor_id", "m.vendor_id");
      })
      .where({ "m.vendor_id": vendorId, "mb.role": "customer" })
      .groupBy("m.rpm_min", "m.rpm_max", "m.power_kw", "m.rigidity")
      .select("m.rpm_min", "m.rpm_max", "m.power_kw", "m.rigidity", db.raw("count(*)::int as count")),
  ]);
  return findCoverageGaps(
    machines.map((m) => ({
      rpmMin: Number(m.rpm_min),
      rpmMax: Number(m.rpm_max),
      powerKw: Number(m.power_kw),
      rigidity: Number(m.rigidity),
      count: Number(m.count),
    })),
    classes.map((c) => ({
      slug: c.slug,
      name: c.name,
      rpmMin: Number(c.rpm_min),
      rpmMax: Number(c.rpm_max),
      powerKw: Number(c.power_kw),
      rigidity: Number(c.rigidity),
    })),
  );
}
