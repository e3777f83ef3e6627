import { NextRequest } from "next/server";
import { afterAll, describe, expect, it } from "vitest";

import { POST as stopDigest } from "@/app/api/v1/vendors/[vendor]/field/digest/stop/route";
import { createAlertStopToken } from "@/lib/bench/alert-token";
import { db } from "@/lib/db/knex";
import { weekStartOf } from "@/lib/field/digest-content";
import { refreshFieldRollups } from "@/lib/field/refresh-rollups";
import { sendDigestOnRequest, sendVendorDigests } from "@/lib/field/send-digest";
import { getBoss } from "@/lib/jobs/boss";
import { setMailPreference, wantsMail } from "@/lib/mail-preferences/mail-preferences";
import { readStopToken } from "@/lib/mail/stop-token";
import { createBenchSheet } from "@/tests/factories/bench";
import { reportOutcomes } from "@/tests/factories/field";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { loadVendor } from "@/tests/factories/tickets";

afterAll(async () => {
  await (await getBoss()).stop({ graceful: false, wait: true });
});

type Mail = { subject: string; text: string; html: string; headers: Record<string, string> };
const mailsTo = async (email: string): Promise<Mail[]> =>
  (await db.raw("select data from pgboss.job where name = 'mail.send' and data->>'to' = ?", [email])).rows.map(
    (r: { data: Mail }) => r.data,
  );
const stop = (slug: string, token: string) =>
  stopDigest(
    new NextRequest(`http://localhost/api/v1/vendors/${slug}/field/digest/stop?token=${encodeURIComponent(token)}`, { method: "POST" }),
  );

describe("weekly Field-results digest", () => {
  it("goes to engineers and admins once a week with the top items and a one-click stop; a retry sends nothing twice", async () => {
    const { vendor, admin, engineer, engineer2, support, customer } = await createVendorWithStaff();
    const sheet = await createBenchSheet(vendor.id);
    await reportOutcomes(vendor.id, sheet.versionId, { asWritten: 4, failed: { melting_welding: 6 } });
    await refreshFieldRollups();
    const v = await loadVendor(vendor.id);
    const monday = new Date("2026-11-30T07:00:00Z");

    expect(await sendVendorDigests(v, monday)).toBe(3);
    const [mail] = await mailsTo(engineer.user.email);
    expect(mail.subject).toContain("1 version needs attention");
    expect(mail.text).toMatch(/1\. .*version 1: failed in 6 of 10 reports \(95 % interval 31 %–83 %\), mostly melting or welding/);
    expect(mail.headers["List-Unsubscribe"]).toMatch(/field\/digest\/stop\?token=/);
    expect(await mailsTo(admin.user.email)).toHaveLength(1);
    expect(await mailsTo(support.user.email)).toHaveLength(0);
    expect(await mailsTo(customer.user.email)).toHaveLength(0);

    // Retried later the same week (a crash, a second scheduler tick): nothing twice.
    expect(await sendVendorDigests(v, new Date("2026-12-03T12:00:00Z"))).toBe(0);
    expect(await mailsTo(engineer.user.email)).toHaveLength(1);

    // One click on the stop link turns it off for that person only.
    const token = new URL(mail.headers["List-Unsubscribe"].slice(1, -1)).searchParams.get("token")!;
    expect((await stop(vendor.slug, token)).status).toBe(200);
    expect(await wantsMail(undefined, { vendorId: vendor.id, userId: engineer.user.id, kind: "weekly_digest" })).toBe(false);
    expect(await sendVendorDigests(v, new Date("2026-12-07T07:00:00Z"))).toBe(2);
    expect(await mailsTo(engineer.user.email)).toHaveLength(1);
    expect(await mailsTo(engineer2.user.email)).toHaveLength(2);
  });

  it("sends on request even between Mondays, and only to the vendor's engineers", async () => {
    const a = await createVendorWithStaff();
    const b = await createVendorWithStaff();
    const va = await loadVendor(a.vendor.id);
    expect(await sendDigestOnRequest(va, a.engineer.user.id)).toBe(true);
    expect(await sendDigestOnRequest(va, b.engineer.user.id)).toBe(false);
    expect(await sendDigestOnRequest(va, a.customer.user.id)).toBe(false);
    const [mail] = await mailsTo(a.engineer.user.email);
    expect(mail.text).toContain("Nothing failed on a published version.");
  });

  it("accepts only a digest token made for this vendor: not a change-alert token, not another vendor's", async () => {
    const a = await createVendorWithStaff();
    const b = await createVendorWithStaff();
    const who = { vendorId: a.vendor.id, userId: a.engineer.user.id };
    expect((await stop(a.vendor.slug, createAlertStopToken(who))).status).toBe(400);
    expect(readStopToken("weekly-digest", createAlertStopToken(who))).toBeNull();
    await setMailPreference({ ...who, kind: "weekly_digest", enabled: true });
    await sendDigestOnRequest(await loadVendor(a.vendor.id), a.engineer.user.id);
    const [mail] = await mailsTo(a.engineer.user.email);
    const token = new URL(mail.headers["List-Unsubscribe"].slice(1, -1)).searchParams.get("token")!;
    expect((await stop(b.vendor.slug, token)).status).toBe(400);
    expect(await wantsMail(undefined, { ...who, kind: "weekly_digest" })).toBe(true);
  });

  it("counts weeks from Monday, UTC", () => {
    expect(weekStartOf(new Date("2026-12-02T10:00:00Z"))).toBe("2026-11-30");
    expect(weekStartOf(new Date("2026-11-30T00:00:00Z"))).toBe("2026-11-30");
    expect(weekStartOf(new Date("2026-12-06T23:59:59Z"))).toBe("2026-11-30");
  });
});
