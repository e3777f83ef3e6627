import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";

import { GET as readImage } from "@/app/[vendor]/(customer)/library/cutters/[sku]/image/route";
import { POST as upload } from "@/app/[vendor]/(staff)/drafting/cutters/[sku]/image/route";
import { createPersonalToken } from "@/lib/auth/personal-access-tokens";
import { createCatalogue } from "@/tests/factories/catalogue";
import { createVendorWithStaff } from "@/tests/factories/foundation";

type Handler = (request: NextRequest, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;
// A 1×1 PNG (ISO/IEC 15948: signature, IHDR, IDAT, IEND).
const PNG = Buffer.from(
  "89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c4890000000d4944415478da63f8cfc0f01f0005000201a2a0e1df0000000049454e44ae426082",
  "hex",
);

const send = (handler: unknown, method: string, params: Record<string, string>, token: string, body?: Uint8Array) =>
  (handler as Handler)(
    new NextRequest("http://localhost/x", {
      method,
      headers: { authorization: `Bearer ${token}` },
      body: body ? new Uint8Array(body) : undefined,
    }),
    { params: Promise.resolve(params) },
  );

describe("cutter image routes", () => {
  it("stores a PNG checked by content, serves it to readers, refuses a disguised file and another vendor's token", async () => {
    const { vendor, engineer, customer } = await createVendorWithStaff();
    const { cutter } = await createCatalogue(vendor.id);
    const other = await createVendorWithStaff();
    const token = (await createPersonalToken({ vendorId: vendor.id, userId: engineer.user.id, name: "t" })).secret;
    const customerToken = (await createPersonalToken({ vendorId: vendor.id, userId: customer.user.id, name: "t" })).secret;
    const foreign = (await createPersonalToken({ vendorId: other.vendor.id, userId: other.engineer.user.id, name: "t" })).secret;
    const params = { vendor: vendor.slug, sku: cutter.sku };

    expect((await send(upload, "POST", params, token, new TextEncoder().encode("GIF89a? no, a script"))).status).toBe(400);
    expect((await send(upload, "POST", params, customerToken, PNG)).status).toBe(404);
    expect((await send(upload, "POST", params, foreign, PNG)).status).toBe(404);
    expect((await send(upload, "POST", params, token, PNG)).status).toBe(201);

    const served = await send(readImage, "GET", params, customerToken);
    expect([served.status, served.headers.get("content-type")]).toEqual([200, "image/png"]);
    expect(Buffer.from(await served.arrayBuffer()).equals(PNG)).toBe(true);
    expect((await send(readImage, "GET", { vendor: other.vendor.slug, sku: cutter.sku }, foreign)).status).toBe(404);
  });
});
