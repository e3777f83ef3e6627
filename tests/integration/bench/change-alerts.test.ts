import { afterAll, describe, expect, it } from "vitest";

import { machineFieldsSchema } from "@/content-schema/machine-fields";
import { setupCreateSchema } from "@/content-schema/setup-fields";
import { createAlertStopToken, readAlertStopToken } from "@/lib/bench/alert-token";
import { createSetup } from "@/lib/bench/create-setup";
import { createMachine } from "@/lib/bench/machines";
import { sendChangeAlerts } from "@/lib/bench/send-change-alerts";
import { db } from "@/lib/db/knex";
import { getBoss } from "@/lib/jobs/boss";
import { setMailPreference } from "@/lib/mail-preferences/mail-preferences";
import { createBenchSheet, supersede, weakMachineFields } from "@/tests/factories/bench";
import { createMember, createVendorWithStaff } from "@/tests/factories/foundation";

afterAll(async () => {
  await (await getBoss()).stop({ graceful: false, wait: true });
});

const mailsTo = async (email: string) =>
  (await db.raw("select data from pgboss.job where name = 'mail.send' and data->>'to' = ?", [email])).rows.map(
    (r: { data: { subject: string; text: string; html: string; headers: Record<string, string> } }) => r.data,
  );

async function customerWithSetups(vendorId: string, versionId: string, count: number) {
  const member = await createMember(vendorId, "customer");
  const machine = await createMachine({ vendorId, userId: member.user.id, fields: machineFieldsSchema.parse(weakMachineFields) });
  for (let i = 0; i < count; i++) {
    await createSetup({
      vendorId,
      userId: member.user.id,
      input: setupCreateSchema.parse({ versionId, machineId: machine.id, operationIndex: i % 2 }),
    });
  }
  return member.user;
}

describe("change alerts", () => {
  it("sends one e-mail per customer per supersession, with the diff re-adapted to their machine; a retry sends none twice", async () => {
    const { vendor } = await createVendorWithStaff();
    const sheet = await createBenchSheet(vendor.id);
    const two = await customerWithSetups(vendor.id, sheet.versionId, 2);
    const one = await customerWithSetups(vendor.id, sheet.versionId, 1);
    // v2 lowers the slot feed 1800 → 1440 mm/min: fz 0.1 → 0.08 mm at the sheet's 18 000 rpm.
    const event = await supersede(vendor.id, sheet.sheetId, { vf: "1440 mm/min" });

    expect(await sendChangeAlerts(event)).toBe(2);
    const [mail] = await mailsTo(two.email);
    expect(await mailsTo(two.email)).toHaveLength(1);
    expect(await mailsTo(one.email)).toHaveLength(1);
    expect(mail.subject).toContain("version 2 replaces version 1");
    // On the desk router n is clamped to 16 000 rpm: vf = 0.1·16000 = 1600 before, 0.08·16000 = 1280 after (−20 %).
    expect(mail.text).toContain("vf (feed rate): 1600\u00a0mm/min → 1280\u00a0mm/min (-20.0\u00a0%)");
    // The sheet as written: 1800 → 1440 mm/min.
    expect(mail.text).toMatch(/vf \(feed rate\): 1800\u00a0mm\/min → 1440\u00a0mm\/min/);
    expect(mail.headers["List-Unsubscribe"]).toMatch(/setups\/alerts\/stop\?token=/);

    // The job is retried (e.g. after a crash): nothing is sent again.
    expect(await sendChangeAlerts(event)).toBe(0);
    expect(await mailsTo(two.email)).toHaveLength(1);
  });

  it("sends nothing to a customer who stopped change alerts through the signed link", async () => {
    const { vendor } = await createVendorWithStaff();
    const sheet = await createBenchSheet(vendor.id);
    const user = await customerWithSetups(vendor.id, sheet.versionId, 1);
    const token = createAlertStopToken({ vendorId: vendor.id, userId: user.id });
    expect(readAlertStopToken(`${token.slice(0, -2)}xx`)).toBeNull();
    const who = readAlertStopToken(token);
    expect(who).toEqual({ vendorId: vendor.id, userId: user.id });
    await setMailPreference({ ...who!, kind: "change_alerts", enabled: false });
    expect(await sendChangeAlerts(await supersede(vendor.id, sheet.sheetId))).toBe(0);
    expect(await mailsTo(user.email)).toHaveLength(0);
  });

  it("ignores a first publication and a withdrawal", async () => {
    const { vendor } = await createVendorWithStaff();
    const sheet = await createBenchSheet(vendor.id);
    expect(
      await sendChangeAlerts({
        type: "version.published",
        vendorId: vendor.id,
        sheetId: sheet.sheetId,
        versionId: sheet.versionId,
        supersededVersionId: null,
      }),
    ).toBe(0);
    expect(
      await sendChangeAlerts({ type: "version.withdrawn", vendorId: vendor.id, sheetId: sheet.sheetId, versionId: sheet.versionId }),
    ).toBe(0);
  });

  it("re-adapts both versions to the machine as it is now, so a machine edit does not show up as a sheet change", async () => {
    const { vendor } = await createVendorWithStaff();
    const sheet = await createBenchSheet(vendor.id);
    const user = await customerWithSetups(vendor.id, sheet.versionId, 1);
    // The customer slows the spindle to 12 000 rpm after saving: vf = 0.1·12000 = 1200 before, 0.08·12000 = 960 after.
    await db("machines").where({ vendor_id: vendor.id, user_id: user.id }).update({ rpm_max: 12000 });
    await sendChangeAlerts(await supersede(vendor.id, sheet.sheetId, { vf: "1440 mm/min" }));
    const [mail] = await mailsTo(user.email);
    expect(mail.text).toContain("vf (feed rate): 1200\u00a0mm/min → 960\u00a0mm/min (-20.0\u00a0%)");
    expect(mail.text).not.toMatch(/n \(spindle speed\):/);
  });
});
