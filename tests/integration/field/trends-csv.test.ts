import { NextRequest } from "next/server";
import { afterAll, describe, expect, it } from "vitest";

import { GET as fieldListRoute } from "@/app/api/v1/vendors/[vendor]/field/[list]/route";
import { refreshFieldRollups } from "@/lib/field/refresh-rollups";
import { getBoss } from "@/lib/jobs/boss";
import { createApiToken } from "@/tests/factories/api-tokens";
import { createBenchSheet } from "@/tests/factories/bench";
import { reportOutcomes } from "@/tests/factories/field";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { loadVendor } from "@/tests/factories/tickets";

afterAll(async () => {
  await (await getBoss()).stop({ graceful: false, wait: true });
});

async function get(slug: string, token: string, query: string) {
  const response = await fieldListRoute(
    new NextRequest(`http://localhost/api/v1/vendors/${slug}/field/sheet-trends?${query}`, {
      headers: { authorization: `Bearer ${token}` },
    }),
    { params: Promise.resolve({ vendor: slug, list: "sheet-trends" }) },
  );
  return { status: response.status, type: response.headers.get("content-type") ?? "", body: await response.text() };
}

describe("the weekly trends of a sheet as CSV", () => {
  it("has one row per week of the range, zeros for quiet weeks, shares and the Wilson interval as fractions", async () => {
    const { vendor, engineer } = await createVendorWithStaff();
    const v = await loadVendor(vendor.id);
    const sheet = await createBenchSheet(vendor.id);
    await reportOutcomes(vendor.id, sheet.versionId, { asWritten: 3, failed: { chatter: 1 } }, undefined, {
      at: new Date("2026-11-03T10:00:00Z"),
    });
    await refreshFieldRollups();
    const token = await createApiToken(vendor.id, engineer.user.id);
    const csv = await get(v.slug, token, `sheet=${sheet.sheetSlug}&from=2026-11-02&to=2026-11-15`);
    expect(csv.status).toBe(200);
    expect(csv.type).toMatch(/^text\/csv/);
    const rows = csv.body.trim().split(/\r?\n/);
    expect(rows[0]).toMatch(/^sheet,week_start,reports,failed,failure_share,wilson_lower_[\d.]+,wilson_upper_[\d.]+,published_versions$/);
    expect(rows.slice(1).map((r) => r.split(",").slice(0, 5))).toEqual([
      [sheet.sheetSlug, "2026-11-02", "4", "1", "0.2500"],
      [sheet.sheetSlug, "2026-11-09", "0", "0", ""],
    ]);
  });

  it("names a wrong range and another vendor's sheet is not found", async () => {
    const a = await createVendorWithStaff();
    const b = await createVendorWithStaff();
    const sheetB = await createBenchSheet(b.vendor.id);
    const va = await loadVendor(a.vendor.id);
    const token = await createApiToken(a.vendor.id, a.engineer.user.id);
    const sheetA = await createBenchSheet(a.vendor.id);
    expect((await get(va.slug, token, `sheet=${sheetA.sheetSlug}&from=2026-13-40`)).status).toBe(400);
    expect((await get(va.slug, token, `sheet=${sheetA.sheetSlug}&from=2020-01-01&to=2026-01-01`)).status).toBe(400);
    expect((await get(va.slug, token, `sheet=${sheetB.sheetSlug}`)).status).toBe(404);
  });
});
