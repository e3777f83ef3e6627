import { unit } from "mathjs";
import { NextRequest } from "next/server";
import { beforeEach, describe, expect, it, vi } from "vitest";

import { GET as versionPdf } from "@/app/[vendor]/(customer)/library/[sheet]/v/[n]/pdf/route";
import type { SessionUser } from "@/lib/auth/session-user";
import { db } from "@/lib/db/knex";
import { createBenchSheet, supersede } from "@/tests/factories/bench";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { readPdf } from "@/tests/support/pdf-text";

const session = vi.hoisted(() => ({ user: null as SessionUser | null }));
vi.mock("@/lib/auth/session-user", () => ({ findSessionUser: async () => session.user }));

const as = (user: { id: string; email: string; name: string } | null) => {
  session.user = user ? { id: user.id, email: user.email, name: user.name, isOperator: false } : null;
};
const get = (vendor: string, sheet: string, n: string) =>
  versionPdf(new NextRequest(`http://127.0.0.1:3000/${vendor}/library/${sheet}/v/${n}/pdf`), {
    params: Promise.resolve({ vendor, sheet, n }),
  });
const squash = (text: string) => text.replace(/[\u00a0\u202f]/g, " ").replace(/\s+/g, " ");

beforeEach(() => as(null));

describe("the printable data sheet of a sheet version", () => {
  it("prints branding, cutter, both unit systems, the cautions, the version and its address", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const sheet = await createBenchSheet(vendor.id);
    as(customer.user);
    const res = await get(vendor.slug, sheet.sheetSlug, "1");
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/pdf");
    const { text, pages } = readPdf(new Uint8Array(await res.arrayBuffer()));
    const t = squash(text);
    expect(pages).toBe(1);
    expect(t).toContain(vendor.name);
    expect(t).toContain(`version 1`);
    expect(t).toContain(sheet.cutterSku);
    // The slot: vf 1800 mm/min = 70.9 in/min and ap 1.5 mm = 0.0591 in (÷ 25.4, NIST SP 811); the cutter's DC 3.175 mm = 0.125 in;
    // fz = 1800 / (1 × 18 000) = 0.100 mm = 0.00394 in per tooth.
    expect(t).toMatch(/Full-width slot 18000 rpm 1800 mm\/min/);
    expect(t).toContain("70.9 in/min");
    expect(unit(1800, "mm/min").toNumber("in/min")).toBeCloseTo(70.9, 1);
    expect(unit(1.5, "mm").toNumber("in")).toBeCloseTo(0.0591, 4);
    expect(t).toMatch(/1\.5 mm/);
    expect(t).toContain("0.0591 in");
    expect(t).toMatch(/3\.175 mm \(0\.125 in\)/);
    expect(t).toContain("0.100 mm/tooth");
    expect(t).toContain("0.00394 in/tooth");
    // The sheet's own caution, and the usual ones that defer to the machine maker and the workplace.
    expect(t).toContain("Keep the feed up: a rubbing cutter melts acrylic.");
    expect(t).toContain("Follow the machine maker's limits, local codes and workplace rules");
    expect(t).toContain("Never leave a cut unattended.");
    expect(t).toContain(`/${vendor.slug}/library/${sheet.sheetSlug}/v/1`);
  });

  it("prints a superseded version with a notice of the current one; a withdrawn version and a draft are not printed", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const sheet = await createBenchSheet(vendor.id);
    await supersede(vendor.id, sheet.sheetId);
    as(customer.user);
    const old = squash(readPdf(new Uint8Array(await (await get(vendor.slug, sheet.sheetSlug, "1")).arrayBuffer())).text);
    expect(old).toMatch(/Superseded on .*the current version is 2/);
    await db("sheet_versions")
      .where({ vendor_id: vendor.id, sheet_id: sheet.sheetId, number: 2 })
      .update({ state: "withdrawn", withdrawn_at: db.fn.now(), withdrawn_reason: "Chatter on light routers." });
    expect((await get(vendor.slug, sheet.sheetSlug, "2")).status).toBe(404);
    await db("sheet_versions").insert({
      vendor_id: vendor.id,
      sheet_id: sheet.sheetId,
      number: 3,
      state: "draft",
      title: "Draft",
      source: "",
      front_matter: "{}",
    });
    expect((await get(vendor.slug, sheet.sheetSlug, "3")).status).toBe(404);
    expect((await get(vendor.slug, sheet.sheetSlug, "abc")).status).toBe(404);
  });

  it("keeps a customers-only Library closed: a visitor must sign in, another vendor's customer gets 404", async () => {
    const { vendor, customer } = await createVendorWithStaff({ settings: { libraryPublic: false } });
    const other = await createVendorWithStaff();
    const sheet = await createBenchSheet(vendor.id);
    expect((await get(vendor.slug, sheet.sheetSlug, "1")).status).toBe(401);
    as(other.customer.user);
    expect((await get(vendor.slug, sheet.sheetSlug, "1")).status).toBe(404);
    // The other vendor's address with this vendor's sheet: not found there either.
    expect((await get(other.vendor.slug, sheet.sheetSlug, "1")).status).toBe(404);
    as(customer.user);
    expect((await get(vendor.slug, sheet.sheetSlug, "1")).status).toBe(200);
  });
});
