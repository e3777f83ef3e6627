import { afterAll, describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { getCoverageGaps } from "@/lib/field/coverage";
import { listCustomerChanges } from "@/lib/field/customer-changes";
import { coverageGapsCsv, customerChangesCsv, needsAttentionCsv, sheetVersionsCsv } from "@/lib/field/field-csv";
import { getFieldSummary } from "@/lib/field/field-summary";
import { listNeedsAttention } from "@/lib/field/needs-attention";
import { refreshFieldRollups } from "@/lib/field/refresh-rollups";
import { sendVendorDigests } from "@/lib/field/send-digest";
import { findSheetFieldResults } from "@/lib/field/sheet-field-results";
import { getBoss } from "@/lib/jobs/boss";
import { createBenchSheet } from "@/tests/factories/bench";
import { createFieldCustomer, reportOutcomes } from "@/tests/factories/field";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { loadVendor } from "@/tests/factories/tickets";

afterAll(async () => {
  await (await getBoss()).stop({ graceful: false, wait: true });
});

const mailsTo = async (email: string) =>
  (await db.raw("select data from pgboss.job where name = 'mail.send' and data->>'to' = ?", [email])).rows.map(
    (r: { data: { text: string } }) => r.data,
  );

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
    expect(await getFieldSummary({ vendorId: a.vendor.id })).toMatchObject({ outcomes: 4, failed: 1 });
    // A's one customer machine (made by reportOutcomes), none of B's.
    expect((await getCoverageGaps({ vendorId: a.vendor.id })).machines).toBe(1);
    // B's sheet id under A's vendor finds nothing.
    expect(await findSheetFieldResults({ vendorId: a.vendor.id, sheetId: sheetB.sheetId, z: 1.96 })).toBeNull();

    expect(await sendVendorDigests(await loadVendor(a.vendor.id))).toBeGreaterThan(0);
    const [digest] = await mailsTo(a.engineer.user.email);
    expect(digest.text).toContain(sheetA.sheetSlug);
    expect(digest.text).not.toContain(sheetB.sheetSlug);
    expect(digest.text).not.toMatch(/failed in 9 of 13|melting/i);
    expect(digest.text).not.toContain("5,000 rpm");
  });

  it("shows engineers aggregates only: no customer's name, e-mail, machine name or notes in any list, CSV or digest", async () => {
    const { vendor, engineer } = await createVendorWithStaff();
    const sheet = await createBenchSheet(vendor.id);
    const customer = await reportOutcomes(vendor.id, sheet.versionId, { afterChanges: 3, failed: { chatter: 4 } });
    await db("users").where({ id: customer.userId }).update({ name: "Wilhelmina Quarrington" });
    await db("machines").where({ id: customer.machineId }).update({ name: "Quarrington garage router" });
    await db("outcomes").where({ user_id: customer.userId }).update({ notes: "private note from the shop floor" });
    await refreshFieldRollups();

    const v = await loadVendor(vendor.id);
    const attention = await listNeedsAttention({ vendorId: vendor.id, z: 1.96 });
    const changes = await listCustomerChanges({ vendorId: vendor.id });
    const coverage = await getCoverageGaps({ vendorId: vendor.id });
    const sheetResults = (await findSheetFieldResults({ vendorId: vendor.id, sheetId: sheet.sheetId, z: 1.96 }))!;
    expect(attention).toHaveLength(1);
    expect(changes).toHaveLength(1);
    await sendVendorDigests(v);
    const [digest] = await mailsTo(engineer.user.email);
    const everything = [
      JSON.stringify({
        attention,
        changes,
        coverage,
        summary: await getFieldSummary({ vendorId: vendor.id }),
        versions: sheetResults.versions,
        changesOfSheet: sheetResults.changes,
      }),
      needsAttentionCsv(attention, 0.95),
      customerChangesCsv(changes),
      coverageGapsCsv(coverage),
      sheetVersionsCsv(sheet.sheetSlug, sheetResults.versions, 0.95),
      digest.text,
    ].join("\n");
    for (const secret of ["Quarrington", customer.email, customer.userId, customer.machineId, "private note"])
      expect(everything).not.toContain(secret);
  });
});
