import { afterAll, describe, expect, it } from "vitest";

import { machineFieldsSchema } from "@/content-schema/machine-fields";
import { setupCreateSchema } from "@/content-schema/setup-fields";
import { createSetup } from "@/lib/bench/create-setup";
import { createMachine } from "@/lib/bench/machines";
import { sendChangeAlerts } from "@/lib/bench/send-change-alerts";
import { db } from "@/lib/db/knex";
import { sendVendorDigests } from "@/lib/field/send-digest";
import { getBoss } from "@/lib/jobs/boss";
import { findPreferencesPerson } from "@/lib/mail-preferences/find-preferences-person";
import { setMailPreference, wantsMail } from "@/lib/mail-preferences/mail-preferences";
import { addCustomerMessage, addStaffMessage } from "@/lib/tickets/add-message";
import { createBenchSheet, supersede, weakMachineFields } from "@/tests/factories/bench";
import { createMember, createVendorWithStaff } from "@/tests/factories/foundation";
import { loadVendor, openTicket } from "@/tests/factories/tickets";

afterAll(async () => {
  await (await getBoss()).stop({ graceful: false, wait: true });
});

type Queued = { to: string; subject: string; text: string; html?: string };
const mailsTo = async (to: string): Promise<Queued[]> =>
  (await db.raw("select data from pgboss.job where name = 'mail.send' and data->>'to' = ? order by created_on", [to])).rows.map(
    (r: { data: Queued }) => r.data,
  );

/** The footer's preferences link, opened as its reader would: it must lead to that person's own preferences. */
async function footerLeadsTo(mail: Queued, vendorSlug: string, userId: string) {
  const link = mail.text.match(/Choose which mails you get: (\S+)/)?.[1];
  expect(link, "the text part ends with the preferences link").toBeDefined();
  if (mail.html) expect(mail.html).toContain(">Mail preferences</a>");
  const url = new URL(link!);
  expect(url.pathname).toBe(`/${vendorSlug}/mail-preferences`);
  const person = await findPreferencesPerson({ vendorSlug, token: url.searchParams.get("token") });
  expect(person?.userId).toBe(userId);
}

describe("mail preferences are honoured by every sender", () => {
  it("change alerts: a customer who turned them off gets none; the others' mail carries the footer", async () => {
    const { vendor } = await createVendorWithStaff();
    const sheet = await createBenchSheet(vendor.id);
    const people = [];
    for (const _ of [1, 2]) {
      const member = await createMember(vendor.id, "customer");
      const machine = await createMachine({
        vendorId: vendor.id,
        userId: member.user.id,
        fields: machineFieldsSchema.parse(weakMachineFields),
      });
      await createSetup({
        vendorId: vendor.id,
        userId: member.user.id,
        input: setupCreateSchema.parse({ versionId: sheet.versionId, machineId: machine.id, operationIndex: 0 }),
      });
      people.push(member.user);
    }
    await setMailPreference({ vendorId: vendor.id, userId: people[1].id, kind: "change_alerts", enabled: false });
    expect(await sendChangeAlerts(await supersede(vendor.id, sheet.sheetId))).toBe(1);
    const [mail] = await mailsTo(people[0].email);
    await footerLeadsTo(mail, vendor.slug, people[0].id);
    expect(await mailsTo(people[1].email)).toEqual([]);
  });

  it("weekly digest: an engineer who turned it off gets none; the others' digest carries the footer", async () => {
    const { vendor: v, engineer, admin } = await createVendorWithStaff();
    const vendor = await loadVendor(v.id);
    await setMailPreference({ vendorId: v.id, userId: engineer.user.id, kind: "weekly_digest", enabled: false });
    expect(await sendVendorDigests(vendor, new Date("2026-12-07T07:00:00Z"))).toBeGreaterThan(0);
    expect(await mailsTo(engineer.user.email)).toEqual([]);
    const [digest] = await mailsTo(admin.user.email);
    await footerLeadsTo(digest, v.slug, admin.user.id);
  });

  it("ticket notifications: new tickets, staff replies and customer replies skip whoever turned them off", async () => {
    const { vendor: v, support, customer } = await createVendorWithStaff();
    const second = await createMember(v.id, "support");
    await setMailPreference({ vendorId: v.id, userId: second.user.id, kind: "ticket_notifications", enabled: false });
    const ticket = await openTicket(v.id, customer.user.id, { subject: "Melted edge" });
    const [notice] = await mailsTo(support.user.email);
    expect(notice.subject).toMatch(/New ticket: Melted edge/);
    await footerLeadsTo(notice, v.slug, support.user.id);
    expect(await mailsTo(second.user.email)).toEqual([]);

    await addStaffMessage({
      vendorId: v.id,
      ticketId: ticket.id,
      authorId: support.user.id,
      body: "Raise the feed.",
      visibility: "public",
    });
    const [reply] = await mailsTo(customer.user.email);
    await footerLeadsTo(reply, v.slug, customer.user.id);
    // The footer sits below the reply, so answering by mail above the line still works.
    expect(reply.text.indexOf("Raise the feed.")).toBeLessThan(reply.text.indexOf("Choose which mails you get"));

    await setMailPreference({ vendorId: v.id, userId: customer.user.id, kind: "ticket_notifications", enabled: false });
    await addStaffMessage({ vendorId: v.id, ticketId: ticket.id, authorId: support.user.id, body: "Any luck?", visibility: "public" });
    expect(await mailsTo(customer.user.email)).toHaveLength(1);

    await setMailPreference({ vendorId: v.id, userId: support.user.id, kind: "ticket_notifications", enabled: false });
    await addCustomerMessage({ vendorId: v.id, ticketId: ticket.id, authorId: customer.user.id, body: "Better now." });
    expect(await mailsTo(support.user.email)).toHaveLength(1);
  });

  it("batch mails: senders ask wantsMail for batch_changes; on unless turned off, per vendor", async () => {
    const a = await createVendorWithStaff();
    const b = await createVendorWithStaff();
    const who = { vendorId: a.vendor.id, userId: a.customer.user.id };
    expect(await wantsMail(undefined, { ...who, kind: "batch_changes" })).toBe(true);
    await db.transaction((trx) => setMailPreference({ ...who, kind: "batch_changes", enabled: false }, trx));
    expect(await db.transaction((trx) => wantsMail(trx, { ...who, kind: "batch_changes" }))).toBe(false);
    expect(await wantsMail(undefined, { ...who, kind: "change_alerts" })).toBe(true);
    expect(await wantsMail(undefined, { vendorId: b.vendor.id, userId: a.customer.user.id, kind: "batch_changes" })).toBe(true);
  });
});
