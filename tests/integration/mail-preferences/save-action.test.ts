import { describe, expect, it, vi } from "vitest";

import { saveMailPreferencesAction } from "@/app/[vendor]/(public)/mail-preferences/actions";
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
