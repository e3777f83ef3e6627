import { describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { listQueue } from "@/lib/desk/list-queue";
import { parseQueueFilters, queueFiltersToSearch } from "@/lib/desk/queue-filters";
import { createVendorWithStaff } from "@/tests/factories/foundation";
import { openTicket } from "@/tests/factories/tickets";

describe("desk queue search and order", () => {
  it("finds a ticket by its number or by words of its subject or question, newest first by default", async () => {
    const { vendor, support, customer } = await createVendorWithStaff();
    const old = await openTicket(vendor.id, customer.user.id, { subject: "Chatter in MDF", body: "The 6 mm cutter sings in the corners." });
    const mid = await openTicket(vendor.id, customer.user.id, { subject: "Melting acrylic", body: "Chips weld back into the slot." });
    const fresh = await openTicket(vendor.id, customer.user.id, {
      subject: "Broken cutter",
      body: "Snapped on the first plunge; 100% depth.",
    });
    await db("tickets")
      .where({ id: old.id })
      .update({ created_at: new Date(Date.now() - 3 * 3_600_000) });
    await db("tickets")
      .where({ id: mid.id })
      .update({ created_at: new Date(Date.now() - 2 * 3_600_000) });
    const number = (await db("tickets").where({ id: mid.id }).first("number"))?.number as number;
    const ids = async (query: Record<string, string>) =>
      (await listQueue({ vendorId: vendor.id, userId: support.user.id, filters: parseQueueFilters(query) })).map((t) => t.id);

    expect(await ids({})).toEqual([fresh.id, mid.id, old.id]);
    expect(await ids({ sort: "oldest" })).toEqual([old.id, mid.id, fresh.id]);
    expect(await ids({ q: `#${number}` })).toEqual([mid.id]);
    expect(await ids({ q: "weld back" })).toEqual([mid.id]);
    expect(await ids({ q: "sings" })).toEqual([old.id]);
    // "%" and "_" are matched as characters, not as patterns.
    expect(await ids({ q: "100%" })).toEqual([fresh.id]);
    expect(await ids({ q: "%" })).toEqual([fresh.id]);
  });

  it("keeps search and order in the query string, leaving the default order out", () => {
    expect(queueFiltersToSearch(parseQueueFilters({ q: "melting", sort: "target", assignee: "me" }))).toBe(
      "assignee=me&q=melting&sort=target",
    );
    expect(queueFiltersToSearch(parseQueueFilters({ sort: "newest" }))).toBe("");
  });
});
