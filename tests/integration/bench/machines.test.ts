import { describe, expect, it } from "vitest";

import { machineFieldsSchema } from "@/content-schema/machine-fields";
import { createMachine, deleteMachine, findMachine, listMachines, updateMachine } from "@/lib/bench/machines";
import { weakMachineFields } from "@/tests/factories/bench";
import { createMember, createVendorWithStaff } from "@/tests/factories/foundation";

const messages = (input: Record<string, unknown>) => {
  const parsed = machineFieldsSchema.safeParse(input);
  return parsed.success ? {} : Object.fromEntries(parsed.error.issues.map((i) => [i.path.join("."), i.message]));
};

describe("machine validation", () => {
  it("names the problem: lowest speed above highest, zero power, a feed that is not a feed", () => {
    const errors = messages({ ...weakMachineFields, rpmMin: "20000", rpmMax: "16000", powerKw: "0", maxFeedMmMin: "fast" });
    expect(errors.rpmMin).toMatch(/lowest spindle speed is above the highest/);
    expect(errors.powerKw).toMatch(/more than 0 kW/);
    expect(errors.maxFeedMmMin).toMatch(/feed/i);
  });

  it('reads feeds and stick-outs with their units (70 in/min = 1778 mm/min, 3/4" = 19.05 mm)', () => {
    const parsed = machineFieldsSchema.parse({ ...weakMachineFields, maxFeedMmMin: "70 in/min", stickoutMm: '3/4"' });
    // 1 in = 25.4 mm exactly (NIST SP 811).
    expect(parsed.maxFeedMmMin).toBeCloseTo(70 * 25.4, 9);
    expect(parsed.stickoutMm).toBeCloseTo(0.75 * 25.4, 9);
  });
});

describe("machines are per vendor and per customer", () => {
  it("stores the rigidity class as its factor and lists only the owner's machines", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const other = await createMember(vendor.id, "customer");
    const fields = machineFieldsSchema.parse(weakMachineFields);
    const mine = await createMachine({ vendorId: vendor.id, userId: customer.user.id, fields });
    expect(mine.rigidity).toBe(0.35);
    expect((await listMachines({ vendorId: vendor.id, userId: customer.user.id })).map((m) => m.id)).toEqual([mine.id]);
    expect(await listMachines({ vendorId: vendor.id, userId: other.user.id })).toEqual([]);
    expect(await findMachine({ vendorId: vendor.id, userId: other.user.id, machineId: mine.id })).toBeNull();
    await expect(updateMachine({ vendorId: vendor.id, userId: other.user.id, machineId: mine.id, fields })).rejects.toMatchObject({
      code: "not_found",
    });
    await expect(deleteMachine({ vendorId: vendor.id, userId: other.user.id, machineId: mine.id })).rejects.toMatchObject({
      code: "not_found",
    });
  });

  it("does not find a machine through another vendor", async () => {
    const a = await createVendorWithStaff();
    const b = await createVendorWithStaff();
    const machine = await createMachine({
      vendorId: a.vendor.id,
      userId: a.customer.user.id,
      fields: machineFieldsSchema.parse(weakMachineFields),
    });
    expect(await findMachine({ vendorId: b.vendor.id, userId: a.customer.user.id, machineId: machine.id })).toBeNull();
    const updated = await updateMachine({
      vendorId: a.vendor.id,
      userId: a.customer.user.id,
      machineId: machine.id,
      fields: machineFieldsSchema.parse({ ...weakMachineFields, name: "Desk router, new spindle", powerKw: "1.5" }),
    });
    expect(updated).toMatchObject({ name: "Desk router, new spindle", powerKw: 1.5 });
    await deleteMachine({ vendorId: a.vendor.id, userId: a.customer.user.id, machineId: machine.id });
    expect(await listMachines({ vendorId: a.vendor.id, userId: a.customer.user.id })).toEqual([]);
  });
});
