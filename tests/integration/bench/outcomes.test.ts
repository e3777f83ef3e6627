import { describe, expect, it } from "vitest";

import { machineFieldsSchema } from "@/content-schema/machine-fields";
import { outcomeFieldsSchema } from "@/content-schema/outcome-fields";
import { setupCreateSchema } from "@/content-schema/setup-fields";
import { createSetup } from "@/lib/bench/create-setup";
import { findSetup } from "@/lib/bench/list-setups";
import { createMachine } from "@/lib/bench/machines";
import { findOutcomePhoto, listOutcomes, recordOutcome } from "@/lib/bench/outcomes";
import { createBenchSheet, weakMachineFields } from "@/tests/factories/bench";
import { createMember, createVendorWithStaff } from "@/tests/factories/foundation";

// The 8-byte PNG signature and an IHDR chunk: enough for content sniffing to call it a PNG.
const PNG = Buffer.from(
  "89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c4890000000d4944415478da63f8ffff3f0005fe02fea7d6a4c80000000049454e44ae426082",
  "hex",
);

async function fixture() {
  const staff = await createVendorWithStaff();
  const sheet = await createBenchSheet(staff.vendor.id);
  const machine = await createMachine({
    vendorId: staff.vendor.id,
    userId: staff.customer.user.id,
    fields: machineFieldsSchema.parse(weakMachineFields),
  });
  const setup = await createSetup({
    vendorId: staff.vendor.id,
    userId: staff.customer.user.id,
    input: setupCreateSchema.parse({ versionId: sheet.versionId, machineId: machine.id }),
  });
  return { ...staff, sheet, setup };
}

describe("outcome reports", () => {
  it("asks for a symptom when a cut failed, and for the changed numbers when it worked after changes", () => {
    const failed = outcomeFieldsSchema.safeParse({ result: "failed" });
    expect(failed.success ? [] : failed.error.issues.map((i) => i.path.join("."))).toEqual(["symptom"]);
    const changed = outcomeFieldsSchema.safeParse({ result: "worked_after_changes" });
    expect(changed.success ? [] : changed.error.issues.map((i) => i.path.join("."))).toEqual(["changes"]);
    expect(outcomeFieldsSchema.safeParse({ result: "worked_as_written", symptom: "chatter" }).success).toBe(false);
  });

  it("records outcomes against the pinned version and lists them newest first, with the last one on the setup", async () => {
    const { vendor, customer, sheet, setup } = await fixture();
    const owner = { vendorId: vendor.id, userId: customer.user.id, setupId: setup.id };
    await recordOutcome({
      ...owner,
      fields: outcomeFieldsSchema.parse({ result: "failed", symptom: "melting_welding", notes: "Chips welded in the slot." }),
    });
    await new Promise((r) => setTimeout(r, 5));
    await recordOutcome({
      ...owner,
      fields: outcomeFieldsSchema.parse({ result: "worked_after_changes", changes: { feedMmMin: { from: 1600, to: 2000 } } }),
      photo: PNG,
    });
    const history = await listOutcomes(owner);
    expect(history.map((o) => [o.result, o.symptom, o.sheetVersionId])).toEqual([
      ["worked_after_changes", null, sheet.versionId],
      ["failed", "melting_welding", sheet.versionId],
    ]);
    expect(history[0]).toMatchObject({ changes: { feedMmMin: { from: 1600, to: 2000 } }, hasPhoto: true });
    expect((await findOutcomePhoto({ vendorId: vendor.id, userId: customer.user.id, outcomeId: history[0].id }))?.contentType).toBe(
      "image/png",
    );
    expect((await findSetup(owner))?.lastOutcome?.result).toBe("worked_after_changes");
  });

  it("refuses a photo that is not an image, and another customer's setup", async () => {
    const { vendor, customer, setup } = await fixture();
    const fields = outcomeFieldsSchema.parse({ result: "worked_as_written" });
    await expect(
      recordOutcome({
        vendorId: vendor.id,
        userId: customer.user.id,
        setupId: setup.id,
        fields,
        photo: Buffer.from("<script>alert(1)</script>"),
      }),
    ).rejects.toMatchObject({ code: "invalid_input" });
    const stranger = await createMember(vendor.id, "customer");
    await expect(recordOutcome({ vendorId: vendor.id, userId: stranger.user.id, setupId: setup.id, fields })).rejects.toMatchObject({
      code: "not_found",
    });
    expect(await listOutcomes({ vendorId: vendor.id, userId: customer.user.id, setupId: setup.id })).toEqual([]);
  });
});
