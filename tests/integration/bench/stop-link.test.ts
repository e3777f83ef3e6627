import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";

import { GET, POST } from "@/app/api/v1/vendors/[vendor]/setups/alerts/stop/route";
import { createAlertStopToken } from "@/lib/bench/alert-token";
import { wantsMail } from "@/lib/mail-preferences/mail-preferences";
import { createVendorWithStaff } from "@/tests/factories/foundation";

const url = (vendorSlug: string, token: string) =>
  `http://127.0.0.1:3000/api/v1/vendors/${vendorSlug}/setups/alerts/stop?token=${encodeURIComponent(token)}`;
// What a mail client's one-click unsubscribe sends (RFC 8058), and what the page's button sends.
const stop = (vendorSlug: string, token: string) =>
  POST(
    new NextRequest(url(vendorSlug, token), {
      method: "POST",
      body: "List-Unsubscribe=One-Click",
      headers: { "content-type": "application/x-www-form-urlencoded" },
    }),
  );

describe("the one-click stop link", () => {
  it("only asks on GET, because mail scanners open links: the button POSTs", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const who = { vendorId: vendor.id, userId: customer.user.id };
    const res = await GET(new NextRequest(url(vendor.slug, createAlertStopToken(who))));
    expect(res.status).toBe(200);
    expect(await res.text()).toMatch(/<form method="post"><button type="submit"[^>]*>Stop change alerts<\/button>/);
    expect(await wantsMail(undefined, { ...who, kind: "change_alerts" })).toBe(true);
  });

  it("turns change alerts off without signing in, for that person and vendor only", async () => {
    const a = await createVendorWithStaff();
    const b = await createVendorWithStaff();
    const who = { vendorId: a.vendor.id, userId: a.customer.user.id };
    expect(await wantsMail(undefined, { ...who, kind: "change_alerts" })).toBe(true);
    const res = await stop(a.vendor.slug, createAlertStopToken(who));
    expect(res.status).toBe(200);
    expect(await res.text()).toContain("Change alerts stopped");
    expect(await wantsMail(undefined, { ...who, kind: "change_alerts" })).toBe(false);
    expect(await wantsMail(undefined, { vendorId: b.vendor.id, userId: a.customer.user.id, kind: "change_alerts" })).toBe(true);
    expect(await wantsMail(undefined, { vendorId: a.vendor.id, userId: a.admin.user.id, kind: "change_alerts" })).toBe(true);
  });

  it("refuses an altered token and changes nothing", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const who = { vendorId: vendor.id, userId: customer.user.id };
    const forged = createAlertStopToken(who).replace(/.$/, (c) => (c === "A" ? "B" : "A"));
    expect((await stop(vendor.slug, forged)).status).toBe(400);
    expect(await wantsMail(undefined, { ...who, kind: "change_alerts" })).toBe(true);
  });

  it("does not work under another vendor's address", async () => {
    const a = await createVendorWithStaff();
    const b = await createVendorWithStaff();
    const who = { vendorId: a.vendor.id, userId: a.customer.user.id };
    expect((await stop(b.vendor.slug, createAlertStopToken(who))).status).toBe(400);
    expect(await wantsMail(undefined, { ...who, kind: "change_alerts" })).toBe(true);
  });
});
