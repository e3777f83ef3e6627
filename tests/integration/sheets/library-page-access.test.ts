import { beforeEach, describe, expect, it, vi } from "vitest";

import SheetPage from "@/app/[vendor]/(customer)/library/[sheet]/page";
import SheetVersionPage from "@/app/[vendor]/(customer)/library/[sheet]/v/[n]/page";
import CutterPage from "@/app/[vendor]/(customer)/library/cutters/[sku]/page";
import type { SessionUser } from "@/lib/auth/session-user";
import { db } from "@/lib/db/knex";
import { createMember, createVendorWithStaff } from "@/tests/factories/foundation";
import { createPublishedSheet } from "@/tests/factories/tickets";
import { mustExist } from "@/tests/support/must-exist";

// A request can render a page segment without its layout, so each Library page checks access itself.
const session = vi.hoisted(() => ({ user: null as SessionUser | null }));
vi.mock("@/lib/auth/session-user", () => ({ findSessionUser: async () => session.user }));
vi.mock("@/components/library/read-units", () => ({ readUnits: async () => "metric" }));
vi.mock("@/lib/library/note-stored-render", () => ({ noteStoredRender: async () => false }));
vi.mock("next/server", async (original) => ({ ...(await original<typeof import("next/server")>()), after: () => undefined }));
// Outside Next's server the "use cache" directive is inert and cacheLife/cacheTag refuse to run: the pages render
// uncached here (what this test is about is the access check, which runs on every request before the cache).
vi.mock("next/cache", async (original) => ({
  ...(await original<typeof import("next/cache")>()),
  cacheLife: () => undefined,
  cacheTag: () => undefined,
}));

const digestOf = async (render: () => Promise<unknown>) => {
  try {
    await render();
    return "rendered";
  } catch (error) {
    return error && typeof error === "object" && "digest" in error ? String(error.digest) : String(error);
  }
};

async function customersOnlyLibrary() {
  const staff = await createVendorWithStaff({ settings: { libraryPublic: false } });
  const sheet = await createPublishedSheet(staff.vendor.id, staff.engineer.user.id);
  const cutter = mustExist(await db("cutters").where({ id: sheet.cutterId }).first("sku"), "cutter");
  const pages = (slug: string) => [
    () => SheetPage({ params: Promise.resolve({ vendor: slug, sheet: sheet.sheetSlug }) }),
    () => SheetVersionPage({ params: Promise.resolve({ vendor: slug, sheet: sheet.sheetSlug, n: "1" }) }),
    () => CutterPage({ params: Promise.resolve({ vendor: slug, sku: cutter.sku }) }),
  ];
  return { ...staff, pages: () => pages(staff.vendor.slug) };
}

describe("Library pages of a customers-only library", () => {
  beforeEach(() => {
    session.user = null;
  });

  it("send a visitor who is not signed in to sign in", async () => {
    const { pages } = await customersOnlyLibrary();
    for (const page of pages()) expect(await digestOf(page)).toMatch(/^NEXT_REDIRECT;.*\/sign-in\?callbackUrl=/);
  });

  it("are not found for someone signed in who is not a customer of the vendor", async () => {
    const { pages } = await customersOnlyLibrary();
    const other = await createVendorWithStaff();
    const outsider = other.customer.user;
    session.user = { id: outsider.id, email: outsider.email, name: outsider.name, isOperator: false };
    for (const page of pages()) expect(await digestOf(page)).toMatch(/404/);
  });

  it("render for the vendor's customers", async () => {
    const { pages, vendor } = await customersOnlyLibrary();
    const { user } = await createMember(vendor.id, "customer");
    session.user = { id: user.id, email: user.email, name: user.name, isOperator: false };
    for (const page of pages()) expect(await digestOf(page)).toBe("rendered");
  });
});
