import { describe, expect, it } from "vitest";

import { resolveVendorAccess } from "@/lib/auth/access";
import type { SessionUser } from "@/lib/auth/session-user";
import { NotFound, Unauthenticated } from "@/lib/errors/domain-errors";
import { createVendor, createVendorWithStaff } from "@/tests/factories/foundation";

const asSession = (u: { id: string; email: string; name: string }): SessionUser => ({ ...u, isOperator: false });

describe("resolveVendorAccess", () => {
  it("gives a member of the vendor its role", async () => {
    const { vendor, engineer } = await createVendorWithStaff();
    const access = await resolveVendorAccess(vendor.slug, asSession(engineer.user), "sheets.author");
    expect(access.member?.role).toBe("engineer");
    expect(access.vendor.id).toBe(vendor.id);
  });

  it("answers NotFound to a member of another vendor, whatever the permission", async () => {
    const a = await createVendorWithStaff();
    const b = await createVendorWithStaff({ settings: { libraryPublic: false } });
    for (const permission of ["library.read", "bench.use", "sheets.author", "desk.use", "members.manage"] as const) {
      await expect(resolveVendorAccess(b.vendor.slug, asSession(a.admin.user), permission)).rejects.toBeInstanceOf(NotFound);
    }
  });

  it("answers NotFound when the role lacks the permission", async () => {
    const { vendor, customer, support } = await createVendorWithStaff();
    await expect(resolveVendorAccess(vendor.slug, asSession(customer.user), "sheets.publish")).rejects.toBeInstanceOf(NotFound);
    await expect(resolveVendorAccess(vendor.slug, asSession(support.user), "members.manage")).rejects.toBeInstanceOf(NotFound);
  });

  it("lets visitors read a public Library but asks them to sign in for a private one", async () => {
    const open = await createVendor({ settings: { libraryPublic: true } });
    const closed = await createVendor({ settings: { libraryPublic: false } });
    await expect(resolveVendorAccess(open.slug, null, "library.read")).resolves.toMatchObject({ user: null });
    await expect(resolveVendorAccess(closed.slug, null, "library.read")).rejects.toBeInstanceOf(Unauthenticated);
    await expect(resolveVendorAccess(open.slug, null, "bench.use")).rejects.toBeInstanceOf(Unauthenticated);
  });

  it("never looks up reserved or malformed slugs", async () => {
    for (const slug of ["api", "operator", "../etc", "A B", "x"]) {
      await expect(resolveVendorAccess(slug, null)).rejects.toBeInstanceOf(NotFound);
    }
  });
});
