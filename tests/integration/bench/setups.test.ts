import { describe, expect, it } from "vitest";

import { machineFieldsSchema } from "@/content-schema/machine-fields";
import { setupCreateSchema } from "@/content-schema/setup-fields";
import { createSetup } from "@/lib/bench/create-setup";
import { findSetup, listSetups } from "@/lib/bench/list-setups";
import { createMachine } from "@/lib/bench/machines";
import { createBenchSheet, supersede, weakMachineFields } from "@/tests/factories/bench";
import { createMember, createVendorWithStaff } from "@/tests/factories/foundation";
import { mustExist } from "@/tests/support/must-exist";

async function fixture() {
  const staff = await createVendorWithStaff();
  const sheet = await createBenchSheet(staff.vendor.id);
  const machine = await createMachine({
    vendorId: staff.vendor.id,
    userId: staff.customer.user.id,
    fields: machineFieldsSchema.parse(weakMachineFields),
  });
  return { ...staff, sheet, machine };
}

describe("saving a setup", () => {
  it("pins the version and stores numbers the server computed, ignoring numbers sent by the client", async () => {
    const { vendor, customer, sheet, machine } = await fixture();
    // A client that sends its own result: the schema drops it, the server recomputes.
    const input = setupCreateSchema.parse({
      versionId: sheet.versionId,
      machineId: machine.id,
      operationIndex: "0",
      ae: "",
      rpm: 99999,
      result: { rpm: 99999 },
    });
    const { id } = await createSetup({ vendorId: vendor.id, userId: customer.user.id, input });
    const row = mustExist(await findSetup({ vendorId: vendor.id, userId: customer.user.id, setupId: id }), "setup");
    expect(row.sheetVersionId).toBe(sheet.versionId);
    // Sheet slot n 18 000 rpm, machine max 16 000 → clamped (rule 4).
    expect(row.result.rpm).toBe(16000);
    // fz = vf/(z·n) = 1800/(1·18000) = 0.1 mm; vf = fz·z·n = 0.1·1·16000 = 1600 mm/min (ISO 3002-1).
    expect(row.result.feedMmMin).toBeCloseTo(1600, 6);
    // ap scales by rigidity share 0.35/0.8 (lib/machining/README.md, rule 8): 1.5 mm · 0.4375 = 0.65625 mm.
    expect(row.result.axialDepthMm).toBeCloseTo(1.5 * (0.35 / 0.8), 9);
    expect(row.result.steps.map((s: { rule: string }) => s.rule)).toEqual(expect.arrayContaining(["spindle-speed-range", "rigidity"]));
  });

  it("applies overrides typed as fractions (ae 1/16 = 1.5875 mm holds hex)", async () => {
    const { vendor, customer, sheet, machine } = await fixture();
    const input = setupCreateSchema.parse({ versionId: sheet.versionId, machineId: machine.id, operationIndex: 0, radialDepthMm: "1/16" });
    const { result } = await createSetup({ vendorId: vendor.id, userId: customer.user.id, input });
    expect(result.radialDepthMm).toBeCloseTo(25.4 / 16, 9);
    // ae = D/2 exactly: hex = fz (lib/machining/README.md), so fz stays 0.1 mm.
    expect(result.chipLoadMm).toBeCloseTo(0.1, 9);
  });

  it("refuses another customer's machine and an unknown version", async () => {
    const { vendor, sheet, machine } = await fixture();
    const stranger = await createMember(vendor.id, "customer");
    const input = setupCreateSchema.parse({ versionId: sheet.versionId, machineId: machine.id });
    await expect(createSetup({ vendorId: vendor.id, userId: stranger.user.id, input })).rejects.toMatchObject({
      code: "invalid_input",
      fieldErrors: { machineId: [expect.any(String)] },
    });
    const other = await createVendorWithStaff();
    await expect(createSetup({ vendorId: other.vendor.id, userId: stranger.user.id, input })).rejects.toMatchObject({
      code: "invalid_input",
    });
  });

  it("lists setups with their version and a newer version once the sheet is superseded", async () => {
    const { vendor, customer, sheet, machine } = await fixture();
    const { id } = await createSetup({
      vendorId: vendor.id,
      userId: customer.user.id,
      input: setupCreateSchema.parse({ versionId: sheet.versionId, machineId: machine.id }),
    });
    expect((await findSetup({ vendorId: vendor.id, userId: customer.user.id, setupId: id }))?.newerVersionNumber).toBeNull();
    await supersede(vendor.id, sheet.sheetId);
    const [summary] = await listSetups({ vendorId: vendor.id, userId: customer.user.id });
    expect(summary).toMatchObject({ id, versionNumber: 1, newerVersionNumber: 2, machineName: "Desk router", lastOutcome: null });
    expect(await findSetup({ vendorId: vendor.id, userId: customer.user.id, setupId: "not-a-uuid" })).toBeNull();
  });
});
