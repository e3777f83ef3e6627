import { randomUUID } from "node:crypto";
import { NextRequest } from "next/server";
import { afterAll, describe, expect, it } from "vitest";

import { POST as calculate } from "@/app/api/v1/calculate/route";
import { GET as openapi } from "@/app/api/v1/openapi.json/route";
import { GET as getSheet } from "@/app/api/v1/vendors/[vendor]/sheets/[slug]/route";
import { GET as listSheets } from "@/app/api/v1/vendors/[vendor]/sheets/route";
import { POST as openTicket } from "@/app/api/v1/vendors/[vendor]/tickets/route";
import {
  apiErrorSchema,
  calculateResultSchema,
  sheetListResponseSchema,
  sheetVersionResponseSchema,
  ticketCreatedResponseSchema,
} from "@/content-schema/api-responses";
import { calculateImperialExample, calculateMetricExample } from "@/lib/api-docs/api-examples";
import { hashToken, newTokenSecret } from "@/lib/auth/api-tokens";
import { db } from "@/lib/db/knex";
import { stopBoss } from "@/lib/jobs/boss";
import { createBenchSheet } from "@/tests/factories/bench";
import { createVendorWithStaff } from "@/tests/factories/foundation";

afterAll(async () => {
  await stopBoss();
});

async function tokenFor(vendorId: string, userId: string) {
  const token = newTokenSecret();
  await db("api_tokens").insert({
    vendor_id: vendorId,
    user_id: userId,
    name: "docs",
    prefix: token.slice(0, 8),
    token_hash: hashToken(token),
  });
  return token;
}

const call = (url: string, token: string, init: { method?: string; body?: unknown } = {}) =>
  new NextRequest(`http://localhost${url}`, {
    method: init.method ?? "GET",
    headers: { authorization: `Bearer ${token}`, ...(init.body ? { "content-type": "application/json" } : {}) },
    ...(init.body ? { body: JSON.stringify(init.body) } : {}),
  });

// The document's answer schemas are checked against what the handlers really answer, so they cannot drift apart.
describe("documented answers", () => {
  it("serves the OpenAPI document", async () => {
    const response = await openapi(new NextRequest("http://localhost/api/v1/openapi.json"));
    expect(response.status).toBe(200);
    const doc = await response.json();
    expect(doc.openapi).toBe("3.1.0");
    expect(doc.paths["/api/v1/vendors/{vendor}/tickets"].post.requestBody.content["application/json"].schema.required).toEqual(
      expect.arrayContaining(["subject", "body", "idempotencyKey"]),
    );
  });

  it("calculate answers as documented, for both examples", async () => {
    for (const body of [calculateMetricExample, calculateImperialExample]) {
      const response = await calculate(
        new NextRequest("http://localhost/api/v1/calculate", {
          method: "POST",
          headers: { "content-type": "application/json" },
          body: JSON.stringify(body),
        }),
      );
      expect(response.status).toBe(200);
      expect(calculateResultSchema.safeParse(await response.json()).error).toBeUndefined();
    }
    const bad = await calculate(
      new NextRequest("http://localhost/api/v1/calculate", { method: "POST", headers: { "content-type": "application/json" }, body: "{}" }),
    );
    expect(bad.status).toBe(400);
    expect(apiErrorSchema.safeParse(await bad.json()).error).toBeUndefined();
  });

  it("sheets, tickets and errors answer as documented", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const sheet = await createBenchSheet(vendor.id);
    const token = await tokenFor(vendor.id, customer.user.id);
    const params = () => ({ params: Promise.resolve({ vendor: vendor.slug }) });
    const sheetParams = (slug: string) => ({ params: Promise.resolve({ vendor: vendor.slug, slug }) });

    const list = await listSheets(call(`/api/v1/vendors/${vendor.slug}/sheets`, token), params());
    expect(sheetListResponseSchema.safeParse(await list.json()).error).toBeUndefined();

    const one = await getSheet(call(`/api/v1/vendors/${vendor.slug}/sheets/${sheet.sheetSlug}`, token), sheetParams(sheet.sheetSlug));
    expect(one.status).toBe(200);
    expect(sheetVersionResponseSchema.safeParse(await one.json()).error).toBeUndefined();

    const missing = await getSheet(call(`/api/v1/vendors/${vendor.slug}/sheets/no-such-sheet`, token), sheetParams("no-such-sheet"));
    expect(missing.status).toBe(404);
    expect(apiErrorSchema.safeParse(await missing.json()).error).toBeUndefined();

    const ticket = await openTicket(
      call(`/api/v1/vendors/${vendor.slug}/tickets`, token, {
        method: "POST",
        body: { subject: "Chatter on the slot", body: "At 1800 mm/min.", idempotencyKey: randomUUID() },
      }),
      params(),
    );
    expect(ticket.status).toBe(201);
    expect(ticketCreatedResponseSchema.safeParse(await ticket.json()).error).toBeUndefined();

    const invalid = await openTicket(
      call(`/api/v1/vendors/${vendor.slug}/tickets`, token, { method: "POST", body: { subject: "" } }),
      params(),
    );
    expect(invalid.status).toBe(400);
    expect(apiErrorSchema.safeParse(await invalid.json()).error).toBeUndefined();
  });
});
