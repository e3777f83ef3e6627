import { describe, expect, it } from "vitest";

import { brandingSchema } from "@/content-schema/vendor-branding";
import { db } from "@/lib/db/knex";
import { InvalidInput } from "@/lib/errors/domain-errors";
import { findVendorBySlug } from "@/lib/vendors/get-vendor";
import { updateBranding } from "@/lib/vendors/update-branding";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { mustExist } from "@/tests/support/must-exist";

// The 8-byte PNG signature and a minimal IHDR chunk header (PNG specification, ISO/IEC 15948, section 5.2).
const PNG = Buffer.concat([
  Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
  Buffer.from("0000000d49484452000000010000000108060000001f15c489", "hex"),
]);
const input = (over: Partial<{ name: string; accentColor: string }> = {}) => ({
  vendor: "x",
  name: "Renamed Co",
  accentColor: "#123456",
  libraryPublic: false,
  requireSecondApproval: true,
  ...over,
});

describe("branding", () => {
  it("saves name, accent, settings and a PNG logo with an audit entry", async () => {
    const { vendor, admin } = await createVendorWithStaff();
    await updateBranding({ vendorId: vendor.id, actorUserId: admin.user.id, input: input(), logo: PNG });
    const row = mustExist(await db("vendors").where({ id: vendor.id }).first(), "row");
    expect(row).toMatchObject({ name: "Renamed Co", accent_color: "#123456", logo_type: "image/png" });
    expect(row.settings).toMatchObject({ libraryPublic: false, requireSecondApproval: true });
    expect(await db("audit_log").where({ vendor_id: vendor.id, action: "vendor.branding" }).first()).toBeTruthy();
  });

  it("refuses a file that only claims to be an image", async () => {
    const { vendor, admin } = await createVendorWithStaff();
    const html = Buffer.from("<html><script>alert(1)</script></html>");
    await expect(updateBranding({ vendorId: vendor.id, actorUserId: admin.user.id, input: input(), logo: html })).rejects.toBeInstanceOf(
      InvalidInput,
    );
    expect((await db("vendors").where({ id: vendor.id }).first())?.logo).toBeNull();
  });

  it("keeps the Field-results confidence unless the form sends one, and accepts only the offered levels", async () => {
    const { vendor, admin } = await createVendorWithStaff({ settings: { wilsonConfidence: 0.9 } });
    await updateBranding({ vendorId: vendor.id, actorUserId: admin.user.id, input: input() });
    expect((await findVendorBySlug(vendor.slug))?.settings.wilsonConfidence).toBe(0.9);
    // As the admin form posts it: checkboxes as "on", the level as a string.
    const form = { vendor: "x", name: "Renamed Co", accentColor: "#123456", requireSecondApproval: "on" };
    await updateBranding({
      vendorId: vendor.id,
      actorUserId: admin.user.id,
      input: brandingSchema.parse({ ...form, wilsonConfidence: "0.99" }),
    });
    expect((await findVendorBySlug(vendor.slug))?.settings.wilsonConfidence).toBe(0.99);
    expect(brandingSchema.safeParse({ ...form, wilsonConfidence: "0.5" }).success).toBe(false);
  });
});
