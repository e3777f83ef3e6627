import { describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { prefillLinks } from "@/lib/tickets/prefill-links";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { createMachine, createPublishedSheet } from "@/tests/factories/tickets";

describe("new ticket prefilled from a sheet or a setup", () => {
  it("takes this vendor's readable sheet version and this customer's machine", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const sheet = await createPublishedSheet(vendor.id);
    const machine = await createMachine(vendor.id, customer.user.id);
    const prefill = await prefillLinks({
      vendorId: vendor.id,
      customerId: customer.user.id,
      sheetVersion: sheet.versionId,
      machine: machine.id,
    });
    expect(prefill).toEqual({
      sheetVersion: { id: sheet.versionId, title: sheet.title, number: 1, materialId: sheet.materialId },
      machine: { id: machine.id, name: machine.name },
    });
  });

  it("ignores another vendor's version, another customer's machine, drafts and junk", async () => {
    const a = await createVendorWithStaff();
    const b = await createVendorWithStaff();
    const foreignSheet = await createPublishedSheet(b.vendor.id);
    const draft = await createPublishedSheet(a.vendor.id);
    await db("sheet_versions").where({ id: draft.versionId }).update({ state: "superseded", superseded_at: db.fn.now() });
    const draftRow = await db("sheet_versions").where({ id: draft.versionId }).first();
    const [openDraft] = await db("sheet_versions")
      .insert({ ...draftRow, id: undefined, number: 2, state: "draft", published_at: null, superseded_at: null })
      .returning("id");
    const otherMachine = await createMachine(a.vendor.id, a.support.user.id);
    const none = { sheetVersion: null, machine: null };
    const ask = (sheetVersion?: string, machine?: string) =>
      prefillLinks({ vendorId: a.vendor.id, customerId: a.customer.user.id, sheetVersion, machine });
    expect(await ask(foreignSheet.versionId, otherMachine.id)).toEqual(none);
    expect(await ask(openDraft.id)).toEqual(none);
    expect(await ask("../../etc", "'; select 1")).toEqual(none);
    expect((await ask(draft.versionId)).sheetVersion?.id).toBe(draft.versionId);
  });
});
