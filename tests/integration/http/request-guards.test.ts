import { NextRequest } from "next/server";
import { beforeEach, describe, expect, it, vi } from "vitest";

import { GET, POST } from "@/app/api/v1/vendors/[vendor]/machines/route";
import { createPersonalToken } from "@/lib/auth/personal-access-tokens";
import type { SessionUser } from "@/lib/auth/session-user";
import { createVendorWithStaff } from "@/tests/factories/foundation";

// The session cookie is what a browser sends on its own; stand in for it with the user it would resolve to.
const session = vi.hoisted(() => ({ user: null as SessionUser | null }));
vi.mock("@/lib/auth/session-user", () => ({ findSessionUser: async () => session.user }));

const ORIGIN = "http://localhost";

function call(
  handler: typeof GET | typeof POST,
  slug: string,
  init: { method: string; headers?: Record<string, string>; body?: BodyInit },
) {
  return handler(new NextRequest(`${ORIGIN}/api/v1/vendors/${slug}/machines`, init), { params: Promise.resolve({ vendor: slug }) });
}

async function signedInCustomer() {
  const staff = await createVendorWithStaff();
  const { user } = staff.customer;
  session.user = { id: user.id, email: user.email, name: user.name, isOperator: false };
  return staff;
}

describe("route handlers with a session cookie", () => {
  beforeEach(() => {
    session.user = null;
  });

  it("refuse a change without an Origin, or from another site, with a clear 403", async () => {
    const { vendor } = await signedInCustomer();
    const variants: Array<Record<string, string>> = [
      {},
      { origin: "https://evil.example" },
      { origin: "null" },
      { origin: "http://localhost.evil.example" },
    ];
    for (const headers of variants) {
      const res = await call(POST, vendor.slug, {
        method: "POST",
        headers: { "content-type": "application/json", ...headers },
        body: "{}",
      });
      expect(res.status).toBe(403);
      expect(await res.json()).toMatchObject({ error: "forbidden", message: expect.stringMatching(/Origin/) });
    }
  });

  it("accept a change from the app's own origin", async () => {
    const { vendor } = await signedInCustomer();
    // An empty machine is invalid: a 400 from the schema shows the request got past the guards.
    const res = await call(POST, vendor.slug, {
      method: "POST",
      headers: { "content-type": "application/json", origin: ORIGIN },
      body: "{}",
    });
    expect(res.status).toBe(400);
  });

  it("read without an Origin", async () => {
    const { vendor } = await signedInCustomer();
    expect((await call(GET, vendor.slug, { method: "GET" })).status).toBe(200);
  });

  it("keep another vendor's route a 404 whatever the Origin", async () => {
    await signedInCustomer();
    const other = await createVendorWithStaff();
    const res = await call(POST, other.vendor.slug, { method: "POST", headers: { "content-type": "application/json" }, body: "{}" });
    expect(res.status).toBe(404);
  });

  it("need no Origin with a personal access token", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const { secret } = await createPersonalToken({ vendorId: vendor.id, userId: customer.user.id, name: "script" });
    const res = await call(POST, vendor.slug, {
      method: "POST",
      headers: { authorization: `Bearer ${secret}`, "content-type": "application/json" },
      body: "{}",
    });
    expect(res.status).toBe(400);
  });
});

describe("JSON bodies", () => {
  it("must be sent as application/json (text/plain is a 415, not read as JSON)", async () => {
    const { vendor } = await signedInCustomer();
    for (const type of ["text/plain", "application/x-www-form-urlencoded", "multipart/form-data; boundary=x", ""]) {
      const res = await call(POST, vendor.slug, {
        method: "POST",
        headers: { origin: ORIGIN, ...(type ? { "content-type": type } : {}) },
        body: "{}",
      });
      expect(res.status, type).toBe(415);
      expect(await res.json()).toMatchObject({ error: "unsupported_media_type", message: expect.stringMatching(/application\/json/) });
    }
    for (const type of ["application/json; charset=utf-8", "application/merge-patch+json"]) {
      const res = await call(POST, vendor.slug, { method: "POST", headers: { origin: ORIGIN, "content-type": type }, body: "{}" });
      expect(res.status, type).toBe(400);
    }
  });

  it("are capped while streaming when no Content-Length is given (413)", async () => {
    const { vendor } = await signedInCustomer();
    let sent = 0;
    const body = new ReadableStream<Uint8Array>({
      pull(controller) {
        // Far past the 64 KiB cap; the reader must stop long before the end.
        if (sent >= 50 * 1024 * 1024) return controller.close();
        sent += 64 * 1024;
        controller.enqueue(new Uint8Array(64 * 1024).fill(32));
      },
    });
    const request = new NextRequest(`${ORIGIN}/api/v1/vendors/${vendor.slug}/machines`, {
      method: "POST",
      headers: { origin: ORIGIN, "content-type": "application/json" },
      body,
      duplex: "half",
    });
    expect(request.headers.get("content-length")).toBeNull();
    const res = await POST(request, { params: Promise.resolve({ vendor: vendor.slug }) });
    expect(res.status).toBe(413);
    expect(sent).toBeLessThan(1024 * 1024);
  });

  it("answer 400 for bytes that are not UTF-8 or not JSON", async () => {
    const { vendor } = await signedInCustomer();
    for (const body of [new Uint8Array([0x7b, 0xff, 0xfe, 0x7d]), new TextEncoder().encode("{not json")]) {
      const res = await call(POST, vendor.slug, { method: "POST", headers: { origin: ORIGIN, "content-type": "application/json" }, body });
      expect(res.status).toBe(400);
      expect(await res.json()).toMatchObject({ error: "invalid_input" });
    }
  });
});
