import { randomUUID } from "node:crypto";
import { describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { createTicket } from "@/lib/tickets/create-ticket";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { createMachine, createPublishedSheet, loadVendor } from "@/tests/factories/tickets";
import { mustExist } from "@/tests/support/must-exist";

const input = (key: string) => ({ subject: "Melting in acrylic", body: "Chips weld.", idempotencyKey: key, attachmentIds: [] });

describe("ticket creation", () => {
  it("a double submit with one key makes one ticket", async () => {
    const { vendor: v, customer } = await createVendorWithStaff();
    const vendor = await loadVendor(v.id);
    const key = randomUUID();
    const [a, b] = await Promise.all([
      createTicket({ vendor, customerId: customer.user.id, input: input(key) }),
      createTicket({ vendor, customerId: customer.user.id, input: input(key) }),
    ]);
    expect(a.id).toBe(b.id);
    expect([a.created, b.created].sort()).toEqual([false, true]);
    const { count } = (await db("tickets").where({ vendor_id: v.id }).count<{ count: string }[]>("* as count").first()) as {
      count: string;
    };
    expect(Number(count)).toBe(1);
  });

  it("the database itself refuses a second row with the same key", async () => {
    const { vendor: v, customer } = await createVendorWithStaff();
    const vendor = await loadVendor(v.id);
    const key = randomUUID();
    const first = await createTicket({ vendor, customerId: customer.user.id, input: input(key) });
    const row = await db("tickets").where({ id: first.id }).first();
    await expect(db("tickets").insert({ ...row, id: randomUUID(), number: 99 })).rejects.toThrow(/idempotency_key/);
  });

  it("sets the first-response target from the vendor's hours for normal priority", async () => {
    const { vendor: v, customer } = await createVendorWithStaff({
      settings: { firstResponseHours: { low: 48, normal: 10, high: 4, urgent: 1 } },
    });
    const vendor = await loadVendor(v.id);
    const t = await createTicket({ vendor, customerId: customer.user.id, input: input(randomUUID()) });
    const row = mustExist(await db("tickets").where({ id: t.id }).first(), "row");
    const hours = (new Date(row.first_response_due_at).getTime() - new Date(row.created_at).getTime()) / 3_600_000;
    expect(hours).toBeCloseTo(10, 6);
  });

  it("links a sheet version and the customer's machine, and refuses another customer's machine", async () => {
    const { vendor: v, customer, support } = await createVendorWithStaff();
    const vendor = await loadVendor(v.id);
    const sheet = await createPublishedSheet(v.id);
    const machine = await createMachine(v.id, customer.user.id);
    const foreign = await createMachine(v.id, support.user.id);
    const t = await createTicket({
      vendor,
      customerId: customer.user.id,
      input: { ...input(randomUUID()), sheetVersionId: sheet.versionId, machineId: machine.id },
    });
    const link = await db("ticket_sheet_links").where({ ticket_id: t.id }).first();
    expect(link).toMatchObject({ sheet_version_id: sheet.versionId, machine_id: machine.id });
    const row = mustExist(await db("tickets").where({ id: t.id }).first(), "row");
    expect(row.material_id).toBe(sheet.materialId);
    await expect(
      createTicket({ vendor, customerId: customer.user.id, input: { ...input(randomUUID()), machineId: foreign.id } }),
    ).rejects.toMatchObject({ code: "invalid_input", fieldErrors: { machineId: expect.any(Array) } });
  });

  it("refuses a sheet version of another vendor", async () => {
    const a = await createVendorWithStaff();
    const b = await createVendorWithStaff();
    const sheetB = await createPublishedSheet(b.vendor.id);
    const vendor = await loadVendor(a.vendor.id);
    await expect(
      createTicket({ vendor, customerId: a.customer.user.id, input: { ...input(randomUUID()), sheetVersionId: sheetB.versionId } }),
    ).rejects.toMatchObject({ code: "invalid_input", fieldErrors: { sheetVersionId: expect.any(Array) } });
  });
});
