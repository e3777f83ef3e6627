import { afterAll, describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { loadCoverageGaps } from "@/lib/field/coverage";
import { listCustomerChanges } from "@/lib/field/customer-changes";
import { loadFieldSummary } from "@/lib/field/field-summary";
import { listNeedsAttention } from "@/lib/field/needs-attention";
import { refreshFieldRollups } from "@/lib/field/refresh-rollups";
import { sendVendorDigests } from "@/lib/field/send-digest";
import { loadSheetFieldResults } from "@/lib/field/sheet-field-results";
import { getBoss } from "@/lib/jobs/boss";
import { createBenchSheet } from "@/tests/factories/bench";
import { createFieldCustomer, reportOutcomes } from "@/tests/factories/field";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { loadVendor } from "@/tests/factories/tickets";

afterAll(async () => {
  await (await getBoss()).stop({ graceful: false, wait: true });
});

const mailsTo = async (email: string) => (await db.raw("select data from pgboss.job where name = 'mail.send' and data->>'to' = ?", [email])).rows.map((r: { data: { text: string } }) => r.data);

describe("Field results across vendors", () => {
  it("never shows vendor B's outcomes, changes, machines or sheets in vendor A's lists or digest", async () => {
    const a = await createVendorWithStaff();
    const b = await createVendorWithStaff();
    const sheetA = await createBenchSheet(a.vendor.id);
    const sheetB = await createBenchSheet(b.vendor.id);
    await reportOutcomes(a.vendor.id, sheetA.versionId, { asWritten: 3, failed: { chatter: 1 } });
    await reportOutcomes(b.vendor.id, sheetB.versionId, { afterChanges: 4, failed: { melting_welding: 9 } });
    await createFieldCustomer(b.vendor.id, { rpm_min: 1000, rpm_max: 5000, power_kw: 0.2, rigidity: 0.1 });
    await refreshFieldRollups();

    const attention = await listNeedsAttention({ vendorId: a.vendor.id, z: 1.96 });
    expect(attention.map((i) => i.versionId)).toEqual([sheetA.versionId]);
    expect(await listCustomerChanges({ vendorId: a.vendor.id })).toEqual([]);
    expect(await loadFieldSummary({ vendorId: a.vendor.id })).toMatchObject({ outcomes: 4, failed: 1 });
    // A's one customer machine (made by reportOutcomes), none of B's.
    expect((await loadCoverageGaps({ vendorId: a.vendor.id })).machines).toBe(1);
    // B's sheet id under A's vendor finds nothing.
    expect(await loadSheetFieldResults({ vendorId: a.vendor.id, sheetId: sheetB.sheetId, z: 1.96 })).toBeNull();

    expect(await sendVendorDigests(await loadVendor(a.vendor.id))).toBeGreaterThan(0);
    const [digest] = await mailsTo(a.engineer.user.email);
    expect(digest.text).toContain(sheetA.sheetSlug);
    expect(digest.text).not.toContain(sheetB.sheetSlug);
    expect(digest.text).not.toMatch(/failed in 9 of 13|melting/i);
    expect(digest.text).not.toContain("5,000 rpm");
  });
});
