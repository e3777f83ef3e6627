import { randomUUID } from "node:crypto";
import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";

import { GET as getOne } from "@/app/api/v1/vendors/[vendor]/tickets/[ticket]/route";
import { POST as create, GET as list } from "@/app/api/v1/vendors/[vendor]/tickets/route";
import { db } from "@/lib/db/knex";
import { addStaffMessage } from "@/lib/tickets/add-message";
import { updateTicket } from "@/lib/tickets/update-ticket";
import { createApiToken } from "@/tests/factories/api-tokens";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { loadVendor } from "@/tests/factories/tickets";

const post = (slug: string, token: string, body: unknown) =>
  create(
    new NextRequest(`http://localhost/api/v1/vendors/${slug}/tickets`, {
      method: "POST",
      body: JSON.stringify(body),
      headers: { authorization: `Bearer ${token}`, "content-type": "application/json" },
    }),
    { params: Promise.resolve({ vendor: slug }) },
  );
const get = (slug: string, token: string, id: string) =>
  getOne(new NextRequest(`http://localhost/api/v1/vendors/${slug}/tickets/${id}`, { headers: { authorization: `Bearer ${token}` } }), {
    params: Promise.resolve({ vendor: slug, ticket: id }),
  });

describe("tickets API", () => {
  it("gives a customer the customer's view only: no tags, priority, assignee or staff e-mail", async () => {
    const { vendor, customer, support } = await createVendorWithStaff();
    await db("users").where({ id: support.user.id }).update({ name: "" });
    const token = await createApiToken(vendor.id, customer.user.id);
    const { ticket } = await (
      await post(vendor.slug, token, { subject: "Burn marks", body: "On every pass.", idempotencyKey: randomUUID() })
    ).json();
    const staffVendor = await loadVendor(vendor.id);
    await updateTicket({
      vendor: staffVendor,
      actorUserId: support.user.id,
      input: { ticketId: ticket.id, assigneeId: support.user.id, priority: "high", tags: ["difficult-customer"] },
    });
    await addStaffMessage({
      vendorId: vendor.id,
      ticketId: ticket.id,
      authorId: support.user.id,
      body: "Lower the spindle speed.",
      visibility: "public",
    });

    const one = await (await get(vendor.slug, token, ticket.id)).json();
    const many = await (
      await list(
        new NextRequest(`http://localhost/api/v1/vendors/${vendor.slug}/tickets`, { headers: { authorization: `Bearer ${token}` } }),
        { params: Promise.resolve({ vendor: vendor.slug }) },
      )
    ).json();
    for (const text of [JSON.stringify(one), JSON.stringify(many)]) {
      expect(text).not.toContain("difficult-customer");
      expect(text).not.toContain(support.user.email);
      expect(text).not.toContain(support.user.id);
      expect(text).not.toMatch(/"(tags|priority|assigneeId|assigneeName|overdue|customerEmail)"/);
    }
    expect(one.ticket.subject).toBe("Burn marks");
    expect(one.messages.map((m: { authorName: string; body: string }) => [m.authorName, m.body])).toEqual([
      ["Support team", "Lower the spindle speed."],
    ]);
    expect(many.tickets.map((t: { id: string }) => t.id)).toEqual([ticket.id]);
  });

  it("creates once per idempotency key (201 then 200) and reads the customer's view without notes", async () => {
    const { vendor, customer, support } = await createVendorWithStaff();
    const token = await createApiToken(vendor.id, customer.user.id);
    const body = { subject: "Broken cutter on plunge", body: "Snapped at the first plunge.", idempotencyKey: randomUUID() };
    const first = await post(vendor.slug, token, body);
    const again = await post(vendor.slug, token, body);
    expect([first.status, again.status]).toEqual([201, 200]);
    const { ticket } = await first.json();
    expect((await again.json()).ticket.id).toBe(ticket.id);

    await addStaffMessage({ vendorId: vendor.id, ticketId: ticket.id, authorId: support.user.id, body: "secret note", visibility: "note" });
    const res = await get(vendor.slug, token, ticket.id);
    expect(res.status).toBe(200);
    const thread = await res.json();
    expect(thread.ticket.subject).toBe("Broken cutter on plunge");
    expect(JSON.stringify(thread)).not.toContain("secret note");
  });

  it("answers 400 with field errors for a bad body", async () => {
    const { vendor, customer } = await createVendorWithStaff();
    const res = await post(vendor.slug, await createApiToken(vendor.id, customer.user.id), { subject: "", body: "" });
    expect(res.status).toBe(400);
    expect(Object.keys((await res.json()).fieldErrors)).toEqual(expect.arrayContaining(["subject", "body", "idempotencyKey"]));
  });

  it("answers 404 for another vendor's ticket and for another customer's ticket", async () => {
    const a = await createVendorWithStaff();
    const b = await createVendorWithStaff();
    const tokenA = await createApiToken(a.vendor.id, a.customer.user.id);
    const { ticket } = await (await post(a.vendor.slug, tokenA, { subject: "Chatter", body: "Loud", idempotencyKey: randomUUID() })).json();
    const tokenB = await createApiToken(b.vendor.id, b.customer.user.id);
    expect((await get(b.vendor.slug, tokenB, ticket.id)).status).toBe(404);
    // A token of vendor A used on vendor B's path is not valid there.
    expect((await get(b.vendor.slug, tokenA, ticket.id)).status).toBe(404);
    const staffA = await createApiToken(a.vendor.id, a.engineer.user.id);
    expect((await post(a.vendor.slug, staffA, { subject: "x y z", body: "b", idempotencyKey: randomUUID() })).status).toBe(404);
  });
});
