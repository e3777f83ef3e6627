import { describe, expect, it } from "vitest";

import { LATEST_THREAD_MESSAGES, type ThreadMessages } from "@/content-schema/api-queries";
import { db } from "@/lib/db/knex";
import { saveAttachment } from "@/lib/tickets/attachments/save-attachment";
import { getTicketThread } from "@/lib/tickets/get-ticket-thread";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { insertThreadMessages, openTicket } from "@/tests/factories/tickets";

const EARLIER = 15;
const LONG = LATEST_THREAD_MESSAGES + EARLIER;
const bodies = (from: number, to: number) => Array.from({ length: to - from + 1 }, (_, i) => `Message ${from + i}`);

async function longThread(count = LONG, note: (n: number) => boolean = () => false) {
  const staff = await createVendorWithStaff();
  const { vendor, customer, support } = staff;
  const ticket = await openTicket(vendor.id, customer.user.id, { body: "The 3 mm cutter chatters in 6082 aluminium." });
  const ids = { vendorId: vendor.id, ticketId: ticket.id, customerId: customer.user.id, supportId: support.user.id };
  const messages = await insertThreadMessages(ids, count, note);
  return { ...staff, ticket, messages };
}

async function attach(vendorId: string, userId: string, ticketId: string, messageId: string | null, fileName: string) {
  const file = await saveAttachment({ vendorId, userId, bytes: Buffer.from("G21\nG1 X10 F1800\n"), fileName });
  await db("ticket_attachments").where({ id: file.id }).update({ ticket_id: ticketId, message_id: messageId });
  return file.id;
}

describe("getTicketThread on a long thread", () => {
  it("shows the question and the latest messages in order, and counts the earlier ones", async () => {
    const { vendor, ticket, messages } = await longThread();
    const thread = await getTicketThread({ vendorId: vendor.id, ticketId: ticket.id, viewer: { kind: "staff" } });
    expect(thread.ticket.body).toBe("The 3 mm cutter chatters in 6082 aluminium.");
    expect(thread.messages.map((m) => m.body)).toEqual(bodies(EARLIER + 1, LONG));
    expect(thread.messages.map((m) => m.id)).toEqual(messages.slice(EARLIER).map((m) => m.id));
    expect(thread.earlierCount).toBe(EARLIER);
  });

  it("reads no more message rows than it shows", async () => {
    const { vendor, ticket } = await longThread();
    const sizes: number[] = [];
    const onResponse = (rows: unknown, query: { sql?: string }) => {
      if (Array.isArray(rows) && /from "ticket_messages"/.test(query.sql ?? "")) sizes.push(rows.length);
    };
    db.on("query-response", onResponse);
    try {
      await getTicketThread({ vendorId: vendor.id, ticketId: ticket.id, viewer: { kind: "staff" } });
    } finally {
      db.off("query-response", onResponse);
    }
    expect(sizes.length).toBeGreaterThan(0);
    expect(Math.max(...sizes)).toBe(LATEST_THREAD_MESSAGES);
  });

  it("gives every message with messages: all", async () => {
    const { vendor, ticket } = await longThread();
    const thread = await getTicketThread({ vendorId: vendor.id, ticketId: ticket.id, messages: "all", viewer: { kind: "staff" } });
    expect(thread.messages.map((m) => m.body)).toEqual(bodies(1, LONG));
    expect(thread.earlierCount).toBe(0);
  });

  it("leaves a thread at the threshold whole", async () => {
    const { vendor, ticket } = await longThread(LATEST_THREAD_MESSAGES);
    const thread = await getTicketThread({ vendorId: vendor.id, ticketId: ticket.id, viewer: { kind: "staff" } });
    expect(thread.messages.map((m) => m.body)).toEqual(bodies(1, LATEST_THREAD_MESSAGES));
    expect(thread.earlierCount).toBe(0);
  });

  it("gives the question's files and those of the shown messages, not of folded ones", async () => {
    const { vendor, support, ticket, messages } = await longThread();
    const question = await attach(vendor.id, support.user.id, ticket.id, null, "question.nc");
    await attach(vendor.id, support.user.id, ticket.id, messages[0].id, "folded.nc");
    const latest = await attach(vendor.id, support.user.id, ticket.id, messages[LONG - 1].id, "latest.nc");
    const folded = await getTicketThread({ vendorId: vendor.id, ticketId: ticket.id, viewer: { kind: "staff" } });
    expect(folded.attachments.map((a) => a.id)).toEqual([question, latest]);
    const all = await getTicketThread({ vendorId: vendor.id, ticketId: ticket.id, messages: "all", viewer: { kind: "staff" } });
    expect(all.attachments.map((a) => a.fileName)).toEqual(["question.nc", "folded.nc", "latest.nc"]);
  });

  it("leaves internal notes out of what a customer is shown and of the count", async () => {
    // Every fourth message is a note: 11 of 45, so the customer's thread has 34 messages, 4 of them folded.
    const { vendor, customer, ticket } = await longThread(LONG, (n) => n % 4 === 0);
    const thread = await getTicketThread({
      vendorId: vendor.id,
      ticketId: ticket.id,
      viewer: { kind: "customer", userId: customer.user.id },
    });
    const publicBodies = bodies(1, LONG).filter((_, i) => (i + 1) % 4 !== 0);
    expect(thread.messages.map((m) => m.body)).toEqual(publicBodies.slice(-LATEST_THREAD_MESSAGES));
    expect(thread.messages.every((m) => m.visibility === "public")).toBe(true);
    expect(thread.earlierCount).toBe(publicBodies.length - LATEST_THREAD_MESSAGES);
    const staff = await getTicketThread({ vendorId: vendor.id, ticketId: ticket.id, viewer: { kind: "staff" } });
    expect(staff.earlierCount).toBe(EARLIER);
  });

  it("does not find another vendor's ticket, folded or whole", async () => {
    const { ticket } = await longThread();
    const other = await createVendorWithStaff();
    const folds: ThreadMessages[] = ["latest", "all"];
    for (const messages of folds) {
      await expect(
        getTicketThread({ vendorId: other.vendor.id, ticketId: ticket.id, messages, viewer: { kind: "staff" } }),
      ).rejects.toMatchObject({ code: "not_found" });
    }
  });
});
