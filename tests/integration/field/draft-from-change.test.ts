import { afterAll, describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { Conflict, NotFound } from "@/lib/errors/domain-errors";
import { listSheetChanges } from "@/lib/field/customer-changes";
import { refreshFieldRollups } from "@/lib/field/refresh-rollups";
import { startDraftFromChange } from "@/lib/field/start-draft-from-change";
import { getBoss } from "@/lib/jobs/boss";
import { validateSheetSource } from "@/lib/mdx/validate-sheet-source";
import { findOpenDraft } from "@/lib/sheets/find-sheet";
import { createBenchSheet } from "@/tests/factories/bench";
import { reportOutcomes } from "@/tests/factories/field";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { mustExist } from "@/tests/support/must-exist";

// Invented demo data: the bench sheet's slot (operation 0) runs n 18 000 rpm, vf 1800 mm/min; its profile (operation 1)
// n 18 000 rpm, vf 1800 mm/min, ap 3 mm. See tests/factories/bench.ts.
const Z95 = 1.959964;

afterAll(async () => {
  await (await getBoss()).stop({ graceful: false, wait: true });
});

async function scenario() {
  const staff = await createVendorWithStaff();
  const sheet = await createBenchSheet(staff.vendor.id);
  // Slot feed lowered by 10, 20, 20, 30 and 40 % → median −20 %, middle half −30 % to −20 %.
  const feeds = [900, 800, 800, 700, 600].map((to) => ({ feedMmMin: { from: 1000, to } }));
  const slotCustomer = await reportOutcomes(
    staff.vendor.id,
    sheet.versionId,
    { asWritten: 3, afterChanges: 5, failed: { chatter: 3 } },
    feeds,
  );
  // The profile's ap, lowered by a third in 2 reports: another operation, another suggestion.
  const profileCustomer = await reportOutcomes(
    staff.vendor.id,
    sheet.versionId,
    { afterChanges: 2 },
    [{ axialDepthMm: { from: 3, to: 2 } }],
    { operationIndex: 1 },
  );
  await refreshFieldRollups();
  const start = (over: Partial<Parameters<typeof startDraftFromChange>[0]> = {}) =>
    startDraftFromChange({
      vendorId: staff.vendor.id,
      userId: staff.engineer.user.id,
      versionId: sheet.versionId,
      operationIndex: 0,
      param: "feedMmMin",
      z: Z95,
      confidenceLabel: "95 %",
      ...over,
    });
  const openDraft = async () => (await findOpenDraft({ vendorId: staff.vendor.id, sheetId: sheet.sheetId }))!;
  return { ...staff, sheet, start, openDraft, customers: [slotCustomer, profileCustomer] };
}

describe("Start a draft from a customers' change", () => {
  it("suggests per operation: the slot's feed and the profile's ap are separate rows", async () => {
    const s = await scenario();
    const changes = await listSheetChanges({ vendorId: s.vendor.id, sheetId: s.sheet.sheetId });
    expect(changes.map((c) => [c.operationIndex, c.operationLabel, c.param, c.reports])).toEqual([
      [0, "Full-width slot", "feedMmMin", 5],
      [1, "Outside profile", "axialDepthMm", 2],
    ]);
  });

  it("opens a new draft version with the reported median applied to that operation only", async () => {
    const s = await scenario();
    const result = await s.start();
    expect(result).toEqual({ slug: s.sheet.sheetSlug, number: 2, existing: false });
    const draft = await s.openDraft();
    expect(draft.state).toBe("draft");
    const checked = validateSheetSource(draft.source);
    expect(checked.ok).toBe(true);
    const [slot, profile] = checked.frontMatter!.operations;
    const median = mustExist(
      mustExist(
        await db("field_change_rollups")
          .where({ vendor_id: s.vendor.id, sheet_version_id: s.sheet.versionId, operation_index: 0, param: "feedMmMin" })
          .first(),
        "rollup",
      ).median_pct,
      "median",
    );
    expect(median).toBeCloseTo(-20, 9);
    expect(slot.vf.value).toBe(1800 * (1 + median / 100));
    expect(slot.vf.text).toBe("1440 mm/min");
    // Everything else is the published version's.
    expect(slot.n.value).toBe(18000);
    expect(profile.vf.value).toBe(1800);
    expect(profile.ap.value).toBe(3);

    const ap = await s.start({ operationIndex: 1, param: "axialDepthMm" }).catch((e: unknown) => e);
    expect(ap).toBeInstanceOf(Conflict);
  });

  it("cites the counts and intervals in the change note, names no customer, and gives the engine's verdict", async () => {
    const s = await scenario();
    await s.start();
    const note = (await s.openDraft()).changeNote;
    expect(note).toContain("1800 mm/min → 1440 mm/min");
    expect(note).toContain("in 5 “worked after changes” reports on version 1 (5 lowered, 0 raised; the middle half ran −30 % to −20 %)");
    expect(note).toMatch(/Version 1 failed in 3 of 13 outcome reports \(95 % interval \d+ %–\d+ %\)/);
    expect(note).toMatch(/Engine check on the Rigid router reference machine: /);
    for (const c of s.customers) {
      expect(note).not.toContain(c.email);
      expect(note).not.toContain(c.email.split("@")[0]);
    }
    // The audit entry records where the draft came from.
    const audit = mustExist(await db("audit_log").where({ vendor_id: s.vendor.id, action: "sheet.new_version" }).first("details"), "audit");
    expect(audit.details).toMatchObject({ fromField: { versionId: s.sheet.versionId, operationIndex: 0, param: "feedMmMin" } });
  });

  it("says so in the note when the engine warns about the new number", async () => {
    const staff = await createVendorWithStaff();
    const sheet = await createBenchSheet(staff.vendor.id);
    // n doubled: 36 000 rpm on a 24 000 rpm class, vc far above acrylic's window.
    await reportOutcomes(staff.vendor.id, sheet.versionId, { afterChanges: 3 }, [{ rpm: { from: 18000, to: 36000 } }]);
    await refreshFieldRollups();
    await startDraftFromChange({
      vendorId: staff.vendor.id,
      userId: staff.engineer.user.id,
      versionId: sheet.versionId,
      operationIndex: 0,
      param: "rpm",
      z: Z95,
      confidenceLabel: "95 %",
    });
    const draft = (await findOpenDraft({ vendorId: staff.vendor.id, sheetId: sheet.sheetId }))!;
    expect(validateSheetSource(draft.source).frontMatter!.operations[0].n.value).toBe(36000);
    expect(draft.changeNote).toMatch(
      /the changed operation raises (a warning|\d+ warnings): .*The engine would change n \(spindle speed\) 36000 → 24000: /,
    );
  });

  it("is idempotent: a second click opens the same draft; one draft version only", async () => {
    const s = await scenario();
    await s.start();
    const again = await s.start();
    expect(again).toEqual({ slug: s.sheet.sheetSlug, number: 2, existing: true });
    expect(
      await db("sheet_versions").where({ vendor_id: s.vendor.id, sheet_id: s.sheet.sheetId }).count<{ count: string }[]>("* as count"),
    ).toEqual([{ count: "2" }]);
  });

  it("refuses clearly while another draft is open, and for a version no longer published", async () => {
    const s = await scenario();
    await db("sheet_versions").insert({
      vendor_id: s.vendor.id,
      sheet_id: s.sheet.sheetId,
      number: 2,
      state: "draft",
      title: "Hand-made draft",
      source: "",
      front_matter: "{}",
    });
    await expect(s.start()).rejects.toThrow(/already has an open draft \(version 2\)/);
    await db("sheet_versions").where({ vendor_id: s.vendor.id, sheet_id: s.sheet.sheetId, number: 2 }).delete();
    await db("sheet_versions").where({ id: s.sheet.versionId }).update({ state: "superseded", superseded_at: db.fn.now() });
    await expect(s.start()).rejects.toThrow(/no longer the published version/);
  });

  it("finds nothing for a suggestion that does not exist, or another vendor's version (404)", async () => {
    const s = await scenario();
    await expect(s.start({ param: "rpm" })).rejects.toBeInstanceOf(NotFound);
    await expect(s.start({ operationIndex: 4 })).rejects.toBeInstanceOf(NotFound);
    const other = await createVendorWithStaff();
    const err = await startDraftFromChange({
      vendorId: other.vendor.id,
      userId: other.engineer.user.id,
      versionId: s.sheet.versionId,
      operationIndex: 0,
      param: "feedMmMin",
      z: Z95,
      confidenceLabel: "95 %",
    }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(NotFound);
    expect(await findOpenDraft({ vendorId: s.vendor.id, sheetId: s.sheet.sheetId })).toBeNull();
  });
});
