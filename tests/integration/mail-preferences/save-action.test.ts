import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it, vi } from "vitest";

import { saveMailPreferencesAction } from "@/app/[vendor]/(public)/mail-preferences/actions";
import MailPreferencesPage from "@/app/[vendor]/(public)/mail-preferences/page";
import { listMailPreferences } from "@/lib/mail-preferences/mail-preferences";
import { createPreferencesToken } from "@/lib/mail-preferences/preferences-link";
import { createVendorWithStaff } from "@/tests/factories/foundation";

vi.mock("@/lib/auth/session-user", () => ({ findSessionUser: async () => null }));

/** What a server action ends in: the redirect's digest (NEXT_REDIRECT;…;url;…) or a not-found digest. */
async function outcome(form: FormData) {
  try {
    await saveMailPreferencesAction(form);
    return "returned";
  } catch (error) {
    return error && typeof error === "object" && "digest" in error ? String(error.digest) : String(error);
  }
}

const formOf = (fields: Record<string, string>) => {
  const form = new FormData();
  for (const [k, v] of Object.entries(fields)) form.set(k, v);
  return form;
};

describe("saving mail preferences from the form", () => {
  it("saves the ticked boxes and comes back to the page saying so", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const token = createPreferencesToken({ vendorId: vendor.id, userId: customer.user.id });
    const digest = await outcome(formOf({ vendor: vendor.slug, token, change_alerts: "on" }));
    expect(digest).toMatch(new RegExp(`^NEXT_REDIRECT;.*/${vendor.slug}/mail-preferences\\?saved=1`));
    expect(await listMailPreferences({ vendorId: vendor.id, userId: customer.user.id })).toMatchObject({
      change_alerts: true,
      ticket_notifications: false,
    });
  });

  it("answers a tampered form on its own page with the reason and saves nothing", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const token = createPreferencesToken({ vendorId: vendor.id, userId: customer.user.id });
    const before = await listMailPreferences({ vendorId: vendor.id, userId: customer.user.id });
    const digest = await outcome(formOf({ vendor: vendor.slug, token, change_alerts: "yes please" }));
    expect(digest).toMatch(new RegExp(`^NEXT_REDIRECT;.*/${vendor.slug}/mail-preferences\\?problem=unreadable&token=`));
    expect(await listMailPreferences({ vendorId: vendor.id, userId: customer.user.id })).toEqual(before);
  });

  it("is not found when even the vendor cannot be read", async () => {
    expect(await outcome(formOf({ vendor: "../../etc", change_alerts: "yes" }))).toMatch(/NOT_FOUND|404/);
  });
});

describe("the mail preferences page reached by a link that no longer works", () => {
  const html = async (vendor: string, token?: string) => {
    try {
      const page = await MailPreferencesPage({
        params: Promise.resolve({ vendor }),
        searchParams: Promise.resolve(token ? { token } : {}),
      });
      return renderToStaticMarkup(page);
    } catch (error) {
      return error && typeof error === "object" && "digest" in error ? String(error.digest) : String(error);
    }
  };

  it("says so and offers sign-in, instead of a bare not-found page; without a link it stays not found", async () => {
    const a = await createVendorWithStaff();
    const token = createPreferencesToken({ vendorId: a.vendor.id, userId: a.customer.user.id });
    const altered = token.replace(/.$/, (c) => (c === "A" ? "B" : "A"));
    const page = await html(a.vendor.slug, altered);
    expect(page).toContain("This link no longer opens your mail preferences.");
    expect(page).toContain(`/sign-in?callbackUrl=${encodeURIComponent(`/${a.vendor.slug}/mail-preferences`)}`);
    expect(await html(a.vendor.slug)).toMatch(/NOT_FOUND|404/);
    expect(await html("no-such-vendor-here", altered)).toMatch(/NOT_FOUND|404/);
  });
});
