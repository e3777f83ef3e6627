import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";

import { GET as list } from "@/app/api/v1/vendors/[vendor]/tickets/route";
import { db } from "@/lib/db/knex";
import { listQueuePage } from "@/lib/desk/list-queue";
import { QUEUE_PAGE_SIZE } from "@/lib/desk/queue-page";
import { listDeskViews } from "@/lib/desk/saved-views";
import { VIEW_COUNT_CAP, viewCountLabel } from "@/lib/desk/view-count";
import { createApiToken } from "@/tests/factories/api-tokens";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { openTicket } from "@/tests/factories/tickets";
import { mustExist } from "@/tests/support/must-exist";

// The Desk queue comes a page at a time: a vendor with thousands of open tickets must not render them all.
async function vendorWithTickets(count: number) {
  const staff = await createVendorWithStaff();
  const first = await openTicket(staff.vendor.id, staff.customer.user.id, { subject: "Queue ticket 1" });
  // The rest as copies of the first, numbered on, one second apart (newest first is by creation time).
  await db.raw(
    `insert into tickets (vendor_id, number, customer_id, subject, body, status, priority, idempotency_key, first_response_due_at, created_at, last_activity_at)
     select vendor_id, number + g, customer_id, 'Queue ticket ' || (g + 1), body, status, priority, idempotency_key || '-' || g,
            first_response_due_at, created_at + g * interval '1 second', last_activity_at
     from tickets, generate_series(1, ?) g where id = ?`,
    [count - 1, first.id],
  );
  return staff;
}

describe("Desk queue pages", () => {
  it("pages through the queue without gaps or repeats, newest first, and says when another page follows", async () => {
    const { vendor, support } = await vendorWithTickets(2 * QUEUE_PAGE_SIZE + 5);
    const pages = [];
    for (const page of [1, 2, 3, 4]) pages.push(await listQueuePage({ vendorId: vendor.id, userId: support.user.id, filters: {}, page }));
    expect(pages.map((p) => [p.page, p.tickets.length, p.hasMore])).toEqual([
      [1, QUEUE_PAGE_SIZE, true],
      [2, QUEUE_PAGE_SIZE, true],
      [3, 5, false],
      [4, 0, false],
    ]);
    const subjects = pages.flatMap((p) => p.tickets.map((t) => t.subject));
    expect(new Set(subjects).size).toBe(2 * QUEUE_PAGE_SIZE + 5);
    expect(subjects[0]).toBe(`Queue ticket ${2 * QUEUE_PAGE_SIZE + 5}`);
    expect(subjects.at(-1)).toBe("Queue ticket 1");

    const oldest = await listQueuePage({ vendorId: vendor.id, userId: support.user.id, filters: { sort: "oldest" }, page: 3 });
    expect(oldest.tickets.map((t) => t.subject).at(-1)).toBe(`Queue ticket ${2 * QUEUE_PAGE_SIZE + 5}`);
  });

  it("answers the API with one page, and page 1 for a page that is no page number", async () => {
    const { vendor, support } = await vendorWithTickets(QUEUE_PAGE_SIZE + 1);
    const token = await createApiToken(vendor.id, support.user.id);
    const call = async (query: string) =>
      (
        await list(
          new NextRequest(`http://localhost/api/v1/vendors/${vendor.slug}/tickets${query}`, {
            headers: { authorization: `Bearer ${token}` },
          }),
          { params: Promise.resolve({ vendor: vendor.slug }) },
        )
      ).json();
    const first = await call("");
    expect([first.page, first.pageSize, first.tickets.length, first.hasMore]).toEqual([1, QUEUE_PAGE_SIZE, QUEUE_PAGE_SIZE, true]);
    const second = await call("?page=2");
    expect([second.page, second.tickets.length, second.hasMore]).toEqual([2, 1, false]);
    expect(second.tickets[0].subject).toBe("Queue ticket 1");
    for (const bad of ["?page=abc", "?page=0", "?page=-3", "?page=1.5", "?page=100000"]) expect((await call(bad)).page).toBe(1);
    // Paging keeps the filters.
    const none = await call("?page=2&status=closed");
    expect([none.page, none.tickets.length, none.hasMore]).toEqual([2, 0, false]);
  });

  it("counts a view's tickets exactly up to the cap, and says 999+ beyond it", async () => {
    const { vendor, support } = await vendorWithTickets(VIEW_COUNT_CAP + 6);
    const openCount = async () =>
      mustExist(
        (await listDeskViews({ vendorId: vendor.id, userId: support.user.id })).find((v) => v.id === "open"),
        "the open view",
      ).count;
    expect(await openCount()).toBe(VIEW_COUNT_CAP + 1);
    expect(viewCountLabel(await openCount())).toBe(`${VIEW_COUNT_CAP}+`);
    await db.raw("update tickets set status = 'closed' where id in (select id from tickets where vendor_id = ? order by number limit 7)", [
      vendor.id,
    ]);
    expect(await openCount()).toBe(VIEW_COUNT_CAP - 1);
    expect(viewCountLabel(VIEW_COUNT_CAP - 1)).toBe(String(VIEW_COUNT_CAP - 1));
  });
});
