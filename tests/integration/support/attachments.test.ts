import { mkdtemp } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { NextRequest } from "next/server";
import { beforeAll, describe, expect, it } from "vitest";

import { GET as download } from "@/app/api/v1/vendors/[vendor]/attachments/[attachment]/route";
import { POST as upload } from "@/app/api/v1/vendors/[vendor]/attachments/route";
import { hashToken } from "@/lib/auth/api-tokens";
import { db } from "@/lib/db/knex";
import { createTicket } from "@/lib/tickets/create-ticket";
import { createApiToken } from "@/tests/factories/api-tokens";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { loadVendor } from "@/tests/factories/tickets";
import { mustExist } from "@/tests/support/must-exist";

// PNG signature and a 1×1 image (ISO/IEC 15948).
const PNG = Buffer.from(
  "89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c4890000000d4944415478da63f8cfc0f01f0005000201a2a0e1df0000000049454e44ae426082",
  "hex",
);
const HTML = Buffer.from("<html><body><script>document.cookie</script></body></html>");

beforeAll(async () => {
  process.env.STORAGE_DIR = await mkdtemp(path.join(os.tmpdir(), "sbk-uploads-"));
});

function uploadRequest(slug: string, token: string, bytes: Buffer, name: string) {
  return upload(
    new NextRequest(`http://localhost/api/v1/vendors/${slug}/attachments`, {
      method: "POST",
      body: new Uint8Array(bytes),
      headers: { authorization: `Bearer ${token}`, "x-file-name": encodeURIComponent(name), "content-length": String(bytes.byteLength) },
    }),
    { params: Promise.resolve({ vendor: slug }) },
  );
}

const downloadRequest = (slug: string, token: string, id: string) =>
  download(
    new NextRequest(`http://localhost/api/v1/vendors/${slug}/attachments/${id}`, { headers: { authorization: `Bearer ${token}` } }),
    {
      params: Promise.resolve({ vendor: slug, attachment: id }),
    },
  );

describe("uploads", () => {
  it("accepts a PNG by its signature and refuses an HTML file named .png", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const token = await createApiToken(vendor.id, customer.user.id);
    const ok = await uploadRequest(vendor.slug, token, PNG, "chips.png");
    expect(ok.status).toBe(201);
    expect((await ok.json()).attachment).toMatchObject({ kind: "image", contentType: "image/png", fileName: "chips.png" });
    const bad = await uploadRequest(vendor.slug, token, HTML, "chips.png");
    expect(bad.status).toBe(400);
    expect(await db("ticket_attachments").where({ vendor_id: vendor.id }).count<{ count: string }[]>("* as count").first()).toEqual({
      count: "1",
    });
  });

  it("answers 413 past 10 MB", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const token = await createApiToken(vendor.id, customer.user.id);
    const big = Buffer.concat([PNG, Buffer.alloc(10 * 1024 * 1024)]);
    expect((await uploadRequest(vendor.slug, token, big, "big.png")).status).toBe(413);
  });

  it("keeps user names out of storage keys (a traversal name is only a display name)", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const token = await createApiToken(vendor.id, customer.user.id);
    const res = await uploadRequest(vendor.slug, token, PNG, "../../etc/passwd.png");
    const { attachment } = await res.json();
    const row = mustExist(await db("ticket_attachments").where({ id: attachment.id }).first(), "row");
    expect(row.storage_key).toMatch(/^[0-9a-f-]{36}$/);
    expect(row.file_name).toBe("passwd.png");
  });
});

describe("downloads", () => {
  it("serve the ticket's customer and Desk staff, with safe headers; nobody else", async () => {
    const a = await createVendorWithStaff();
    const b = await createVendorWithStaff();
    const vendor = await loadVendor(a.vendor.id);
    const customerToken = await createApiToken(a.vendor.id, a.customer.user.id);
    const { attachment } = await (await uploadRequest(a.vendor.slug, customerToken, PNG, "finish.png")).json();
    await createTicket({
      vendor,
      customerId: a.customer.user.id,
      input: { subject: "Poor finish", body: "See photo", idempotencyKey: "k-download-1", attachmentIds: [attachment.id] },
    });

    const own = await downloadRequest(a.vendor.slug, customerToken, attachment.id);
    expect(own.status).toBe(200);
    expect(own.headers.get("x-content-type-options")).toBe("nosniff");
    expect(own.headers.get("content-type")).toBe("image/png");
    expect(own.headers.get("content-disposition")).toMatch(/^inline; filename="finish.png"/);
    expect(Buffer.compare(Buffer.from(await own.arrayBuffer()), PNG)).toBe(0);

    const staff = await downloadRequest(a.vendor.slug, await createApiToken(a.vendor.id, a.support.user.id), attachment.id);
    expect(staff.status).toBe(200);

    const engineer = await downloadRequest(a.vendor.slug, await createApiToken(a.vendor.id, a.engineer.user.id), attachment.id);
    expect(engineer.status).toBe(404);

    const otherCustomer = await createApiToken(
      a.vendor.id,
      (
        await db("users")
          .insert({ email: `x${Date.now()}@example.test` })
          .returning("id")
      )[0].id,
    );
    await db("members").insert({
      vendor_id: a.vendor.id,
      user_id: (
        await db("api_tokens")
          .where({ token_hash: hashToken(otherCustomer) })
          .first()
      )?.user_id,
      role: "customer",
    });
    expect((await downloadRequest(a.vendor.slug, otherCustomer, attachment.id)).status).toBe(404);

    const otherVendorStaff = await createApiToken(b.vendor.id, b.support.user.id);
    expect((await downloadRequest(b.vendor.slug, otherVendorStaff, attachment.id)).status).toBe(404);
  });

  it("offers G-code as a text/plain attachment, never inline", async () => {
    const { vendor: v, customer } = await createVendorWithStaff();
    const token = await createApiToken(v.id, customer.user.id);
    const { attachment } = await (await uploadRequest(v.slug, token, Buffer.from("G21\nG1 X5 F900\n"), "slot.nc")).json();
    const res = await downloadRequest(v.slug, token, attachment.id);
    expect(res.headers.get("content-type")).toBe("text/plain; charset=utf-8");
    expect(res.headers.get("content-disposition")).toMatch(/^attachment; filename="slot.nc"/);
  });
});
