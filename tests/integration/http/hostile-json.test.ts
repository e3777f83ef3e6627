import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";

import { POST } from "@/app/api/v1/vendors/[vendor]/machines/route";
import { createPersonalToken } from "@/lib/auth/personal-access-tokens";
import { db } from "@/lib/db/knex";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { hostileCorpusBytes } from "@/tests/support/hostile-corpus";

// Each hostile JSON body through a real route handler: a clear JSON error (400 or 413), never a 500, a stack trace
// or a saved row.
describe("hostile JSON bodies", () => {
  it.each(hostileCorpusBytes("json"))("%s: a clear JSON error", async (_name, bytes) => {
    const { vendor, customer } = await createVendorWithStaff();
    const { secret } = await createPersonalToken({ vendorId: vendor.id, userId: customer.user.id, name: "script" });
    const request = new NextRequest(`http://localhost/api/v1/vendors/${vendor.slug}/machines`, {
      method: "POST",
      headers: { authorization: `Bearer ${secret}`, "content-type": "application/json" },
      body: new Uint8Array(bytes),
    });
    const res = await POST(request, { params: Promise.resolve({ vendor: vendor.slug }) });
    expect([400, 413]).toContain(res.status);
    const body = await res.json();
    expect(body).toMatchObject({ error: expect.stringMatching(/invalid_input|too_large/), message: expect.any(String) });
    expect(JSON.stringify(body)).not.toMatch(/\n\s+at |node_modules/);
    expect(await db("machines").where({ vendor_id: vendor.id })).toEqual([]);
    expect(Object.prototype).not.toHaveProperty("admin");
  });
});
