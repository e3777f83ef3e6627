import { describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { Conflict, Forbidden, InvalidInput, NotFound } from "@/lib/errors/domain-errors";
import { approveDraft } from "@/lib/sheets/approve-draft";
import { findLibrarySheet } from "@/lib/sheets/find-library-sheet";
import { publishDraft } from "@/lib/sheets/publish-draft";
import { returnToDraft } from "@/lib/sheets/return-to-draft";
import { DraftConflict, saveDraft } from "@/lib/sheets/save-draft";
import { startNewVersion } from "@/lib/sheets/start-new-version";
import { submitDraft } from "@/lib/sheets/submit-draft";
import { withdrawVersion } from "@/lib/sheets/withdraw-version";
import { createDraftingScenario, publishOpenDraft, sourceWithFeed } from "@/tests/factories/sheets";
import { mustExist } from "@/tests/support/must-exist";

const states = async (vendorId: string, slug: string) =>
  db("sheet_versions as v")
    .join("sheets as s", "s.id", "v.sheet_id")
    .where({ "s.slug": slug, "v.vendor_id": vendorId })
    .orderBy("v.number")
    .pluck("v.state");
const auditActions = (vendorId: string) => db("audit_log").where({ vendor_id: vendorId }).orderBy("created_at").pluck("action");

describe("sheet version workflow", () => {
  it("moves draft → in review → approved → published, writing the audit log at each step", async () => {
    const s = await createDraftingScenario();
    expect(await states(s.vendor.id, s.slug)).toEqual(["draft"]);
    await submitDraft({ ...s.as(s.engineer.user.id), changeNote: "First version." });
    expect(await states(s.vendor.id, s.slug)).toEqual(["in_review"]);
    await approveDraft(s.as(s.engineer2.user.id));
    const published = await publishDraft(s.as(s.engineer2.user.id));
    expect(published).toMatchObject({ number: 1, state: "published", superseded: null });
    expect(await auditActions(s.vendor.id)).toEqual(
      expect.arrayContaining(["sheet.create", "sheet.submit", "sheet.approve", "sheet.publish"]),
    );
  });

  it("refuses to submit without a change note, and with a source that has a schema error (naming its line)", async () => {
    const s = await createDraftingScenario();
    await expect(submitDraft({ ...s.as(s.engineer.user.id), changeNote: " " })).rejects.toBeInstanceOf(InvalidInput);
    const bad = sourceWithFeed("1800"); // no unit
    const lineOfVf = bad.split("\n").findIndex((l) => l.includes("vf:")) + 1;
    await saveDraft({ ...s.as(s.engineer.user.id), source: bad, revision: s.created.revision });
    const error = await submitDraft({ ...s.as(s.engineer.user.id), changeNote: "First." }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(InvalidInput);
    expect((error as InvalidInput).fieldErrors?.source?.join(" ")).toContain(`line ${lineOfVf}`);
  });

  it("refuses approval by the author when the vendor requires a second engineer", async () => {
    const s = await createDraftingScenario({ requireSecondApproval: true });
    await submitDraft({ ...s.as(s.engineer.user.id), changeNote: "First." });
    await expect(approveDraft(s.as(s.engineer.user.id))).rejects.toBeInstanceOf(Forbidden);
    expect(await db("sheet_versions").where({ vendor_id: s.vendor.id }).pluck("approved_by")).toEqual([null]);
  });

  it("refuses to publish without approval, and to publish a draft that was never submitted", async () => {
    const s = await createDraftingScenario();
    await expect(publishDraft(s.as(s.engineer2.user.id))).rejects.toBeInstanceOf(Conflict);
    await submitDraft({ ...s.as(s.engineer.user.id), changeNote: "First." });
    await expect(publishDraft(s.as(s.engineer2.user.id))).rejects.toThrow(/approval/);
    expect(await states(s.vendor.id, s.slug)).toEqual(["in_review"]);
  });

  it("lets the author publish alone when the vendor does not require a second approval", async () => {
    const s = await createDraftingScenario({ requireSecondApproval: false });
    await submitDraft({ ...s.as(s.engineer.user.id), changeNote: "First." });
    await expect(publishDraft(s.as(s.engineer.user.id))).resolves.toMatchObject({ state: "published" });
  });

  it("returning a version in review to draft drops its approval", async () => {
    const s = await createDraftingScenario();
    await submitDraft({ ...s.as(s.engineer.user.id), changeNote: "First." });
    await approveDraft(s.as(s.engineer2.user.id));
    await returnToDraft(s.as(s.engineer.user.id));
    const row = mustExist(await db("sheet_versions").where({ vendor_id: s.vendor.id }).first(), "row");
    expect([row.state, row.approved_by]).toEqual(["draft", null]);
  });

  it("a stale save gets a conflict carrying the newer text; nothing is overwritten", async () => {
    const s = await createDraftingScenario();
    const first = await saveDraft({ ...s.as(s.engineer.user.id), source: sourceWithFeed("1700 mm/min"), revision: s.created.revision });
    expect(first.revision).toBe(s.created.revision + 1);
    const stale = await saveDraft({
      ...s.as(s.engineer2.user.id),
      source: sourceWithFeed("1600 mm/min"),
      revision: s.created.revision,
    }).catch((e: unknown) => e);
    expect(stale).toBeInstanceOf(DraftConflict);
    expect((stale as DraftConflict).current).toMatchObject({ revision: first.revision });
    expect((stale as DraftConflict).current.source).toContain("1700 mm/min");
    expect(await db("sheet_versions").where({ vendor_id: s.vendor.id }).pluck("source")).toEqual([sourceWithFeed("1700 mm/min")]);
  });

  it("publishing v2 supersedes v1 in the same transaction; v2 starts as a copy of v1", async () => {
    const s = await createDraftingScenario();
    await publishOpenDraft(s);
    const v2 = await startNewVersion(s.as(s.engineer.user.id));
    const [src1, src2] = await db("sheet_versions").where({ vendor_id: s.vendor.id }).orderBy("number").pluck("source");
    expect(src2).toBe(src1);
    await expect(startNewVersion(s.as(s.engineer.user.id))).rejects.toBeInstanceOf(Conflict);
    await saveDraft({ ...s.as(s.engineer.user.id), source: sourceWithFeed("1620 mm/min"), revision: v2.revision });
    const result = await publishOpenDraft(s, "Feed lowered 10 %.");
    expect(result).toMatchObject({ number: 2, superseded: 1 });
    expect(await states(s.vendor.id, s.slug)).toEqual(["superseded", "published"]);
    const library = await findLibrarySheet({ vendorId: s.vendor.id, slug: s.slug, number: 1 });
    expect(library?.version.state).toBe("superseded");
    expect(library?.current?.number).toBe(2);
  });

  it("the database refuses edits to a published version even through SQL", async () => {
    const s = await createDraftingScenario();
    await publishOpenDraft(s);
    const edit = db("sheet_versions").where({ vendor_id: s.vendor.id }).update({ source: "tampered" });
    await expect(edit).rejects.toThrow(/published and immutable/);
    await expect(db("sheet_versions").where({ vendor_id: s.vendor.id }).update({ state: "draft" })).rejects.toThrow(
      /cannot move from published to draft/,
    );
    await expect(db("sheet_versions").where({ vendor_id: s.vendor.id }).delete()).rejects.toThrow(/cannot be deleted/);
  });

  it("withdrawal needs a reason, which readers then see", async () => {
    const s = await createDraftingScenario();
    await publishOpenDraft(s);
    await expect(withdrawVersion({ ...s.as(s.engineer.user.id), reason: "" })).rejects.toBeInstanceOf(InvalidInput);
    await withdrawVersion({ ...s.as(s.engineer.user.id), reason: "Chatter reported on light routers." });
    const library = await findLibrarySheet({ vendorId: s.vendor.id, slug: s.slug });
    expect(library?.version).toMatchObject({ state: "withdrawn", withdrawnReason: "Chatter reported on light routers." });
    expect(library?.current).toBeNull();
    expect(await auditActions(s.vendor.id)).toContain("sheet.withdraw");
  });

  it("drafts never reach the Library", async () => {
    const s = await createDraftingScenario();
    expect(await findLibrarySheet({ vendorId: s.vendor.id, slug: s.slug })).toBeNull();
    expect(await findLibrarySheet({ vendorId: s.vendor.id, slug: s.slug, number: 1 })).toBeNull();
  });

  it("another vendor's sheet is simply not found", async () => {
    const s = await createDraftingScenario();
    const other = await createDraftingScenario();
    const foreign = { vendorId: other.vendor.id, userId: other.engineer.user.id, slug: s.slug };
    await expect(saveDraft({ ...foreign, source: sourceWithFeed(), revision: 1 })).rejects.toBeInstanceOf(NotFound);
    await expect(submitDraft({ ...foreign, changeNote: "Sneaky." })).rejects.toBeInstanceOf(NotFound);
    await expect(approveDraft(foreign)).rejects.toBeInstanceOf(NotFound);
    await expect(withdrawVersion({ ...foreign, reason: "Sneaky reason." })).rejects.toBeInstanceOf(NotFound);
    expect(await findLibrarySheet({ vendorId: other.vendor.id, slug: s.slug })).toBeNull();
  });
});
