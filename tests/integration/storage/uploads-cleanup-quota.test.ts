import { readdirSync, readFileSync } from "node:fs";
import { mkdtemp } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";

import { machineFieldsSchema } from "@/content-schema/machine-fields";
import { outcomeFieldsSchema } from "@/content-schema/outcome-fields";
import { setupCreateSchema } from "@/content-schema/setup-fields";
import { createSetup } from "@/lib/bench/create-setup";
import { createMachine, deleteMachine } from "@/lib/bench/machines";
import { recordOutcome } from "@/lib/bench/outcomes";
import { db } from "@/lib/db/knex";
import { InvalidInput } from "@/lib/errors/domain-errors";
import { getStorage } from "@/lib/storage";
import { cleanupUploads } from "@/lib/storage/cleanup-uploads";
import { UploadQuotaExceeded } from "@/lib/storage/upload-quota";
import { saveAttachment } from "@/lib/tickets/attachments/save-attachment";
import { createBenchSheet, weakMachineFields } from "@/tests/factories/bench";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { openTicket } from "@/tests/factories/tickets";
import { mustExist } from "@/tests/support/must-exist";

const PNG = Buffer.from(
  "89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c4890000000d4944415478da63f8ffff3f0005fe02fea7d6a4c80000000049454e44ae426082",
  "hex",
);
const gcode = (kb: number) => Buffer.from(`G21\n${"G1 X10 Y10 F1600\n".repeat(Math.ceil((kb * 1024) / 17))}`.slice(0, kb * 1024));
const HOSTILE = path.resolve(import.meta.dirname, "../../fixtures/hostile/uploads");

beforeAll(async () => {
  if (process.env.STORAGE_ENGINE !== "s3") process.env.STORAGE_DIR = await mkdtemp(path.join(os.tmpdir(), "sbk-cleanup-"));
});

const keyOf = async (id: string) => (await db("ticket_attachments").where({ id }).first("storage_key"))?.storage_key as string | undefined;

describe("upload cleanup", () => {
  it("removes files never attached after a day, keeps attached and recent ones", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const old = await saveAttachment({ vendorId: vendor.id, userId: customer.user.id, bytes: PNG, fileName: "old.png" });
    const recent = await saveAttachment({ vendorId: vendor.id, userId: customer.user.id, bytes: PNG, fileName: "recent.png" });
    const attached = await saveAttachment({ vendorId: vendor.id, userId: customer.user.id, bytes: PNG, fileName: "kept.png" });
    const ticket = await openTicket(vendor.id, customer.user.id);
    await db("ticket_attachments").where({ id: attached.id }).update({ ticket_id: ticket.id });
    await db("ticket_attachments")
      .whereIn("id", [old.id, attached.id])
      .update({ created_at: new Date(Date.now() - 25 * 3_600_000) });
    const oldKey = (await keyOf(old.id))!;
    expect(await getStorage().get(oldKey)).not.toBeNull();

    const result = await cleanupUploads();
    expect(result.unattached).toBeGreaterThanOrEqual(1);
    expect(await keyOf(old.id)).toBeUndefined();
    expect(await getStorage().get(oldKey)).toBeNull();
    expect(await getStorage().get((await keyOf(recent.id))!)).not.toBeNull();
    expect(await getStorage().get((await keyOf(attached.id))!)).not.toBeNull();
    expect(await db("upload_deletions").where({ storage_key: oldKey }).first()).toBeUndefined();
  });

  it("a machine's outcome photos go with the machine", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const sheet = await createBenchSheet(vendor.id);
    const owner = { vendorId: vendor.id, userId: customer.user.id };
    const machine = await createMachine({ ...owner, fields: machineFieldsSchema.parse(weakMachineFields) });
    const setup = await createSetup({ ...owner, input: setupCreateSchema.parse({ versionId: sheet.versionId, machineId: machine.id }) });
    await recordOutcome({
      ...owner,
      setupId: setup.id,
      fields: outcomeFieldsSchema.parse({ result: "failed", symptom: "chatter" }),
      photo: PNG,
    });
    const key = mustExist((await db("outcomes").where({ setup_id: setup.id }).first("photo_key"))?.photo_key, "photo key");
    expect(await getStorage().get(key)).not.toBeNull();
    await deleteMachine({ ...owner, machineId: machine.id });
    expect(await getStorage().get(key)).toBeNull();
    expect(await db("upload_deletions").where({ storage_key: key }).first()).toBeUndefined();
  });
});

describe("upload quota", () => {
  it("refuses an upload past the person's quota with a clear error, also under parallel uploads", async () => {
    const { vendor, customer, support } = await createVendorWithStaff();
    process.env.UPLOAD_QUOTA_MB = "1";
    try {
      const results = await Promise.all(
        [1, 2, 3].map((i) =>
          saveAttachment({ vendorId: vendor.id, userId: customer.user.id, bytes: gcode(400), fileName: `part-${i}.nc` }).then(
            () => "saved",
            (e: unknown) => e,
          ),
        ),
      );
      expect(results.filter((r) => r === "saved")).toHaveLength(2);
      const refused = results.find((r) => r !== "saved");
      expect(refused).toBeInstanceOf(UploadQuotaExceeded);
      expect((refused as Error).message).toContain("1 MB of upload space");
      // Another person has their own quota.
      await expect(
        saveAttachment({ vendorId: vendor.id, userId: support.user.id, bytes: gcode(400), fileName: "x.nc" }),
      ).resolves.toMatchObject({ kind: "text" });
      expect(await db("ticket_attachments").where({ uploaded_by: customer.user.id }).count("* as n").first()).toMatchObject({ n: "2" });
    } finally {
      delete process.env.UPLOAD_QUOTA_MB;
    }
  });
});

describe("hostile upload files", () => {
  it.each(readdirSync(HOSTILE).filter((f) => f !== "README.md"))("%s is refused as a ticket attachment, nothing stored", async (file) => {
    const { vendor, customer } = await createVendorWithStaff();
    await expect(
      saveAttachment({ vendorId: vendor.id, userId: customer.user.id, bytes: readFileSync(path.join(HOSTILE, file)), fileName: file }),
    ).rejects.toBeInstanceOf(InvalidInput);
    expect(await db("ticket_attachments").where({ uploaded_by: customer.user.id }).first()).toBeUndefined();
  });
});
