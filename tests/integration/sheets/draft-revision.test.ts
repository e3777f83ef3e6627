import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";

import { PUT as putDraft } from "@/app/api/v1/vendors/[vendor]/sheets/[slug]/draft/route";
import { POST as createSheet } from "@/app/api/v1/vendors/[vendor]/sheets/route";
import { createPersonalToken } from "@/lib/auth/personal-access-tokens";
import { db } from "@/lib/db/knex";
import { createCatalogue } from "@/tests/factories/catalogue";
import { createVendorWithStaff, uniq } from "@/tests/factories/foundation";
import { sourceWithFeed } from "@/tests/factories/sheets";

type Handler = (request: NextRequest, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

function call(handler: unknown, params: Record<string, string>, token: string, method: string, body: unknown) {
  const request = new NextRequest(`http://localhost/api/v1/vendors/${params.vendor}/sheets`, {
    method,
    headers: { authorization: `Bearer ${token}`, "content-type": "application/json" },
    body: JSON.stringify(body),
  });
  return (handler as Handler)(request, { params: Promise.resolve(params) });
}

describe("PUT draft without a revision", () => {
  it("is refused with 428 and says how to send it; the open draft is not overwritten", async () => {
    const staff = await createVendorWithStaff();
    await createCatalogue(staff.vendor.id);
    const token = (await createPersonalToken({ vendorId: staff.vendor.id, userId: staff.engineer.user.id, name: "test" })).secret;
    const slug = uniq("lock");
    await call(createSheet, { vendor: staff.vendor.slug }, token, "POST", { slug, source: sourceWithFeed("1800 mm/min") });

    const response = await call(putDraft, { vendor: staff.vendor.slug, slug }, token, "PUT", { source: sourceWithFeed("999 mm/min") });
    expect(response.status).toBe(428);
    const body = await response.json();
    expect(body).toMatchObject({ error: "revision_required", current: { revision: expect.any(Number) } });
    expect(body.message).toMatch(/PUT \{ source, revision \}/);
    const draft = await db("sheet_versions as v").join("sheets as s", "s.id", "v.sheet_id").where({ "s.slug": slug }).first("v.source");
    expect(draft?.source).toContain("1800 mm/min");
  });
});
