import { NextRequest } from "next/server";
import { beforeEach, describe, expect, it, vi } from "vitest";

import { signUpAction } from "@/app/[vendor]/(public)/sign-up/actions";
import { saveViewAction } from "@/app/[vendor]/(staff)/desk/actions";
import { GET as shortLink } from "@/app/c/[code]/route";
import type { SessionUser } from "@/lib/auth/session-user";
import { db } from "@/lib/db/knex";
import { findVendorBySlug } from "@/lib/vendors/get-vendor";
import { createVendorWithStaff } from "@/tests/factories/foundation";

const session = vi.hoisted(() => ({ user: null as SessionUser | null }));
vi.mock("@/lib/auth/session-user", () => ({ findSessionUser: async () => session.user }));

const form = (values: Record<string, string>) => {
  const data = new FormData();
  for (const [key, value] of Object.entries(values)) data.set(key, value);
  return data;
};

describe("inputs that used to escape as raw errors", () => {
  beforeEach(() => {
    session.user = null;
  });

  it("a slug that is not valid percent-encoding is simply not found", async () => {
    await expect(findVendorBySlug("%E0%A4%A")).resolves.toBeNull();
    const res = await shortLink(new NextRequest("http://localhost/c/%E0%A4%A"));
    expect(res.status).toBe(404);
  });

  it("sign-up without a vendor field answers with a message", async () => {
    const result = await signUpAction({ ok: false }, form({ name: "Kim", email: "kim@example.test", password: "long-enough-password" }));
    expect(result).toMatchObject({ ok: false, message: expect.stringMatching(/vendor/) });
  });

  it("saving a Desk view with filters that are not valid names the field and saves nothing", async () => {
    const { vendor, support } = await createVendorWithStaff();
    session.user = { id: support.user.id, email: support.user.email, name: support.user.name, isOperator: false };
    for (const filters of ['{"status":["no-such-status"]}', "{not json", JSON.stringify({ status: "x".repeat(3000) })]) {
      const result = await saveViewAction({ ok: false }, form({ vendor: vendor.slug, name: "Mine", filters }));
      expect(result.ok).toBe(false);
      expect(result, filters).toMatchObject({ message: "Please correct the marked fields." });
      expect(
        Object.keys(result.errors ?? {}).some((key) => key.startsWith("filters")),
        filters,
      ).toBe(true);
    }
    expect(await db("desk_views").where({ vendor_id: vendor.id })).toEqual([]);
    const ok = await saveViewAction({ ok: false }, form({ vendor: vendor.slug, name: "Mine", filters: '{"status":["new"]}' }));
    expect(ok.message).toContain("saved");
    expect(ok.ok).toBe(true);
  });
});
