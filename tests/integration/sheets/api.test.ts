import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";

import { POST as approve } from "@/app/api/v1/vendors/[vendor]/sheets/[slug]/draft/approve/route";
import { POST as publish } from "@/app/api/v1/vendors/[vendor]/sheets/[slug]/draft/publish/route";
import { PUT as putDraft } from "@/app/api/v1/vendors/[vendor]/sheets/[slug]/draft/route";
import { POST as submit } from "@/app/api/v1/vendors/[vendor]/sheets/[slug]/draft/submit/route";
import { GET as getSheet } from "@/app/api/v1/vendors/[vendor]/sheets/[slug]/route";
import { GET as getVersion } from "@/app/api/v1/vendors/[vendor]/sheets/[slug]/versions/[n]/route";
import { POST as withdraw } from "@/app/api/v1/vendors/[vendor]/sheets/[slug]/withdraw/route";
import { POST as createSheet } from "@/app/api/v1/vendors/[vendor]/sheets/route";
import { createPersonalToken } from "@/lib/auth/personal-access-tokens";
import { createCatalogue } from "@/tests/factories/catalogue";
import { createVendorWithStaff, uniq } from "@/tests/factories/foundation";
import { sourceWithFeed } from "@/tests/factories/sheets";

type Handler = (request: NextRequest, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

function call(handler: unknown, method: string, params: Record<string, string>, token: string, body?: unknown) {
  const request = new NextRequest(`http://localhost/api/v1/vendors/${params.vendor}/sheets`, {
    method,
    headers: { authorization: `Bearer ${token}`, "content-type": "application/json" },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  return (handler as Handler)(request, { params: Promise.resolve(params) });
}

async function setup() {
  const staff = await createVendorWithStaff();
  await createCatalogue(staff.vendor.id);
  const token = async (userId: string) => (await createPersonalToken({ vendorId: staff.vendor.id, userId, name: "test" })).secret;
  return {
    ...staff,
    t1: await token(staff.engineer.user.id),
    t2: await token(staff.engineer2.user.id),
    tc: await token(staff.customer.user.id),
  };
}

describe("Drafting JSON API with personal access tokens", () => {
  it("creates, submits, approves and publishes a sheet; the published version reads back as structured data", async () => {
    const s = await setup();
    const slug = uniq("api-sheet");
    const p = { vendor: s.vendor.slug, slug };
    const created = await call(createSheet, "POST", { vendor: s.vendor.slug }, s.t1, { slug, source: sourceWithFeed() });
    expect(created.status).toBe(201);
    expect(await created.json()).toMatchObject({ slug, number: 1, state: "draft" });
    expect((await call(submit, "POST", p, s.t1, {})).status).toBe(400); // change note missing
    expect((await call(submit, "POST", p, s.t1, { changeNote: "First version." })).status).toBe(200);
    expect((await call(approve, "POST", p, s.t1)).status).toBe(403); // the author
    expect((await call(publish, "POST", p, s.t2)).status).toBe(409); // not approved yet
    expect((await call(approve, "POST", p, s.t2)).status).toBe(200);
    expect((await call(publish, "POST", p, s.t2)).status).toBe(200);
    const read = await call(getSheet, "GET", p, s.tc);
    expect(read.status).toBe(200);
    const json = await read.json();
    expect(json).toMatchObject({ number: 1, state: "published", cutter: { sku: "SF-125-O", DC_mm: 3.175 } });
    expect(json.operations[0].vf).toEqual({ text: "1800 mm/min", value: 1800 });
  });

  it("PUT draft starts the next version, answers 409 on a stale revision, and withdraw needs a reason", async () => {
    const s = await setup();
    const slug = uniq("api-sheet");
    const p = { vendor: s.vendor.slug, slug };
    await call(createSheet, "POST", { vendor: s.vendor.slug }, s.t1, { slug, source: sourceWithFeed() });
    await call(submit, "POST", p, s.t1, { changeNote: "First." });
    await call(approve, "POST", p, s.t2);
    await call(publish, "POST", p, s.t2);
    const next = await call(putDraft, "PUT", p, s.t1, { source: sourceWithFeed("1620 mm/min") });
    expect([next.status, (await next.json()).number]).toEqual([201, 2]);
    const stale = await call(putDraft, "PUT", p, s.t2, { source: sourceWithFeed("1500 mm/min"), revision: 0 });
    expect(stale.status).toBe(409);
    expect((await stale.json()).current.source).toContain("1620 mm/min");
    expect((await call(withdraw, "POST", p, s.t1, { reason: "" })).status).toBe(400);
    expect((await call(withdraw, "POST", p, s.t1, { reason: "Wrong feed for light routers." })).status).toBe(200);
    const v1 = await call(getVersion, "GET", { ...p, n: "1" }, s.tc);
    expect(await v1.json()).toMatchObject({ state: "withdrawn", withdrawnReason: "Wrong feed for light routers." });
    expect((await call(getVersion, "GET", { ...p, n: "2" }, s.tc)).status).toBe(404); // a draft
  });

  it("answers 404 for another vendor's token and for a customer's token on drafting calls", async () => {
    const s = await setup();
    const other = await setup();
    const slug = uniq("api-sheet");
    await call(createSheet, "POST", { vendor: s.vendor.slug }, s.t1, { slug, source: sourceWithFeed() });
    expect((await call(putDraft, "PUT", { vendor: s.vendor.slug, slug }, other.t1, { source: sourceWithFeed() })).status).toBe(404);
    expect(
      (await call(createSheet, "POST", { vendor: s.vendor.slug }, other.t1, { slug: uniq("x"), source: sourceWithFeed() })).status,
    ).toBe(404);
    expect((await call(submit, "POST", { vendor: s.vendor.slug, slug }, s.tc, { changeNote: "Customer." })).status).toBe(404);
  });
});
