import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";

import { POST as stopDigest } from "@/app/api/v1/vendors/[vendor]/field/digest/stop/route";
import { POST as stopAlerts } from "@/app/api/v1/vendors/[vendor]/setups/alerts/stop/route";
import { createAlertStopToken } from "@/lib/bench/alert-token";
import { db } from "@/lib/db/knex";
import { findPreferencesPerson } from "@/lib/mail-preferences/find-preferences-person";
import { listMailPreferences, saveMailPreferences } from "@/lib/mail-preferences/mail-preferences";
import { createPreferencesToken } from "@/lib/mail-preferences/preferences-link";
import { createStopToken } from "@/lib/mail/stop-token";
import { createVendorWithStaff } from "@/tests/factories/foundation";

const post = (handler: typeof stopAlerts, url: string, body: string) =>
  handler(new NextRequest(url, { method: "POST", body, headers: { "content-type": "application/x-www-form-urlencoded" } }));

describe("the mail preferences page's signed link", () => {
  it("opens the preferences of the person it was made for, without signing in", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const person = await findPreferencesPerson({
      vendorSlug: vendor.slug,
      token: createPreferencesToken({ vendorId: vendor.id, userId: customer.user.id }),
    });
    expect(person).toMatchObject({ userId: customer.user.id, email: customer.user.email, role: "customer", viaLink: true });
  });

  it("refuses an altered link, another purpose's token, another vendor's address and a former member", async () => {
    const a = await createVendorWithStaff();
    const b = await createVendorWithStaff();
    const who = { vendorId: a.vendor.id, userId: a.customer.user.id };
    const token = createPreferencesToken(who);
    expect(
      await findPreferencesPerson({ vendorSlug: a.vendor.slug, token: token.replace(/.$/, (c) => (c === "A" ? "B" : "A")) }),
    ).toBeNull();
    expect(await findPreferencesPerson({ vendorSlug: a.vendor.slug, token: createStopToken("change-alerts", who) })).toBeNull();
    expect(await findPreferencesPerson({ vendorSlug: b.vendor.slug, token })).toBeNull();
    await db("members").where({ vendor_id: a.vendor.id, user_id: a.customer.user.id }).delete();
    expect(await findPreferencesPerson({ vendorSlug: a.vendor.slug, token })).toBeNull();
  });

  it("saves several kinds at once, for that vendor only", async () => {
    const a = await createVendorWithStaff();
    const who = { vendorId: a.vendor.id, userId: a.customer.user.id };
    await saveMailPreferences({ ...who, choices: { change_alerts: false, ticket_notifications: true, batch_changes: false } });
    expect(await listMailPreferences(who)).toEqual({
      change_alerts: false,
      batch_changes: false,
      ticket_notifications: true,
      weekly_digest: true,
    });
  });
});

describe("the stop links land on the preferences page", () => {
  it("the page's button turns change alerts off and redirects to the person's preferences with a notice", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const who = { vendorId: vendor.id, userId: customer.user.id };
    const res = await post(
      stopAlerts,
      `http://127.0.0.1:3000/api/v1/vendors/${vendor.slug}/setups/alerts/stop?token=${createAlertStopToken(who)}`,
      "via=page",
    );
    expect(res.status).toBe(303);
    const to = new URL(res.headers.get("location")!);
    expect(to.pathname).toBe(`/${vendor.slug}/mail-preferences`);
    expect(to.searchParams.get("stopped")).toBe("change_alerts");
    expect((await findPreferencesPerson({ vendorSlug: vendor.slug, token: to.searchParams.get("token") }))?.userId).toBe(customer.user.id);
    expect((await listMailPreferences(who)).change_alerts).toBe(false);
  });

  it("a mail client's one-click POST (RFC 8058) gets a plain answer that links to the preferences", async () => {
    const { vendor, engineer } = await createVendorWithStaff();
    const who = { vendorId: vendor.id, userId: engineer.user.id };
    const res = await post(
      stopDigest,
      `http://127.0.0.1:3000/api/v1/vendors/${vendor.slug}/field/digest/stop?token=${createStopToken("weekly-digest", who)}`,
      "List-Unsubscribe=One-Click",
    );
    expect(res.status).toBe(200);
    const html = await res.text();
    expect(html).toContain("Weekly digest stopped");
    expect(html).toMatch(new RegExp(`href="[^"]*/${vendor.slug}/mail-preferences\\?token=[^"]+"`));
    expect((await listMailPreferences(who)).weekly_digest).toBe(false);
  });
});
