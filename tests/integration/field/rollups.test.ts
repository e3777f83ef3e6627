import { afterAll, describe, expect, it } from "vitest";

import { machineFieldsSchema } from "@/content-schema/machine-fields";
import { outcomeFieldsSchema } from "@/content-schema/outcome-fields";
import { setupCreateSchema } from "@/content-schema/setup-fields";
import { createSetup } from "@/lib/bench/create-setup";
import { createMachine } from "@/lib/bench/machines";
import { recordOutcome } from "@/lib/bench/outcomes";
import { db } from "@/lib/db/knex";
import { compareVersions } from "@/lib/field/compare-versions";
import { getFieldSummary } from "@/lib/field/field-summary";
import { recordSheetActivity } from "@/lib/field/record-activity";
import { lastFieldRefresh, refreshFieldRollups } from "@/lib/field/refresh-rollups";
import { findSheetFieldResults } from "@/lib/field/sheet-field-results";
import { getBoss } from "@/lib/jobs/boss";
import { createProblemReport } from "@/lib/tickets/problem-reports";
import { createBenchSheet, supersede, weakMachineFields } from "@/tests/factories/bench";
import { reportOutcomes } from "@/tests/factories/field";
import { createMember, createVendorWithStaff } from "@/tests/factories/foundation";
import { openTicket } from "@/tests/factories/tickets";
import { mustExist } from "@/tests/support/must-exist";

const Z95 = 1.959964;

afterAll(async () => {
  await (await getBoss()).stop({ graceful: false, wait: true });
});

describe("Field-results rollups", () => {
  it("counts views, adaptations, setups, outcomes by result and symptom, tickets and hand-offs per version", async () => {
    const { vendor, support } = await createVendorWithStaff();
    const sheet = await createBenchSheet(vendor.id);
    // Through the customer's own path once, so the real recordOutcome feeds the rollup too.
    const member = await createMember(vendor.id, "customer");
    const machine = await createMachine({
      vendorId: vendor.id,
      userId: member.user.id,
      fields: machineFieldsSchema.parse(weakMachineFields),
    });
    const setup = await createSetup({
      vendorId: vendor.id,
      userId: member.user.id,
      input: setupCreateSchema.parse({ versionId: sheet.versionId, machineId: machine.id, operationIndex: 0 }),
    });
    await recordOutcome({
      vendorId: vendor.id,
      userId: member.user.id,
      setupId: setup.id,
      fields: outcomeFieldsSchema.parse({ result: "failed", symptom: "melting_welding" }),
    });
    await reportOutcomes(vendor.id, sheet.versionId, { asWritten: 2, afterChanges: 3, failed: { melting_welding: 4, chatter: 1 } });
    for (let i = 0; i < 5; i++) await recordSheetActivity({ vendorId: vendor.id, versionId: sheet.versionId, kind: "views" });
    for (let i = 0; i < 2; i++) await recordSheetActivity({ vendorId: vendor.id, versionId: sheet.versionId, kind: "adaptations" });
    const ticket = await openTicket(vendor.id, member.user.id, { sheetVersionId: sheet.versionId });
    await db("ticket_sheet_links")
      .insert({ vendor_id: vendor.id, ticket_id: ticket.id, sheet_version_id: sheet.versionId })
      .onConflict(["ticket_id", "sheet_version_id"])
      .ignore();
    await createProblemReport({
      vendorId: vendor.id,
      actorUserId: support.user.id,
      ticketId: ticket.id,
      sheetVersionId: sheet.versionId,
      summary: "Melts at the sheet's feed",
      details: "",
    });

    await refreshFieldRollups();
    const results = await findSheetFieldResults({ vendorId: vendor.id, sheetId: sheet.sheetId, z: Z95 });
    const [v1] = results!.versions;
    // 1 (recordOutcome) + 2 + 3 + 5 outcomes; 1 + 10 setups.
    expect(v1).toMatchObject({
      number: 1,
      views: 5,
      adaptations: 2,
      setups: 11,
      outcomes: 11,
      workedAsWritten: 2,
      workedAfterChanges: 3,
      failed: 6,
      tickets: 1,
      handoffs: 1,
      openHandoffs: 1,
    });
    expect(v1.symptoms).toEqual({ chatter: 1, melting_welding: 5, poor_finish: 0, broken_tool: 0, stalled_lost_steps: 0 });
    expect(results!.tickets.map((t) => t.number)).toEqual([ticket.number]);
    expect(results!.handoffs.map((h) => h.summary)).toEqual(["Melts at the sheet's feed"]);
    expect(await lastFieldRefresh()).toBeInstanceOf(Date);

    const summary = await getFieldSummary({ vendorId: vendor.id });
    expect(summary).toMatchObject({
      versionsWithReports: 1,
      outcomes: 11,
      failed: 6,
      workedAfterChanges: 3,
      setups: 11,
      views: 5,
      adaptations: 2,
      openHandoffs: 1,
    });
  });

  it("shows a v2 that fixed v1: the failure intervals no longer overlap", async () => {
    const { vendor } = await createVendorWithStaff();
    const sheet = await createBenchSheet(vendor.id);
    await reportOutcomes(vendor.id, sheet.versionId, { afterChanges: 2, failed: { melting_welding: 8 } });
    const event = await supersede(vendor.id, sheet.sheetId);
    await reportOutcomes(vendor.id, event.versionId, { asWritten: 12, afterChanges: 1, failed: { poor_finish: 1 } });
    await refreshFieldRollups();
    const { versions } = (await findSheetFieldResults({ vendorId: vendor.id, sheetId: sheet.sheetId, z: Z95 }))!;
    expect(versions.map((v) => [v.number, v.state, v.failed, v.outcomes])).toEqual([
      [1, "superseded", 8, 10],
      [2, "published", 1, 14],
    ]);
    // 8/10 → 0.490–0.943 and 1/14 → 0.013–0.315 at 95 % (Wilson score, computed by hand from Wilson 1927).
    expect(versions[0].failure.lower).toBeCloseTo(0.4902, 3);
    expect(versions[1].failure.upper).toBeCloseTo(0.3147, 3);
    expect(compareVersions(versions[0], versions[1], "95 %").verdict).toBe("fewer_failures");
  });

  it("does not count a view of another vendor's version, nor a draft", async () => {
    const a = await createVendorWithStaff();
    const b = await createVendorWithStaff();
    const sheetB = await createBenchSheet(b.vendor.id);
    await recordSheetActivity({ vendorId: a.vendor.id, versionId: sheetB.versionId, kind: "views" });
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
    await recordSheetActivity({ vendorId: b.vendor.id, versionId: draft.id, kind: "views" });
    expect(await db("sheet_version_activity").whereIn("sheet_version_id", [sheetB.versionId, draft.id])).toEqual([]);
  });
});
