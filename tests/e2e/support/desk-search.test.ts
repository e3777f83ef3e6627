import { afterAll, describe, expect, it } from "vitest";

import { QUEUE_PAGE_SIZE } from "@/lib/desk/queue-page";
import { mustExist } from "@/tests/support/must-exist";

import { openBrowser, screenshot, type Session } from "../support/browser";
import { closeE2eDb, e2eDb } from "../support/db";
import { signInWithPassword } from "../support/sign-in";

describe("desk search", () => {
  const sessions: Session[] = [];
  afterAll(async () => {
    for (const s of sessions) await s.close();
    await closeE2eDb();
  });

  it("finds a ticket by number, keeps the filters in the address across a reload, newest first by default", async () => {
    const db = e2eDb();
    const vendor = mustExist(await db("vendors").where({ slug: "northbeck" }).first("id"), "vendor");
    const ticket = mustExist(
      await db("tickets").where({ vendor_id: vendor.id }).whereNot("status", "closed").orderBy("created_at", "asc").first("id", "number"),
      "ticket",
    );
    const s = await openBrowser();
    sessions.push(s);
    s.page.setDefaultNavigationTimeout(90_000);
    await signInWithPassword(s.page, "support1@northbeck.test", "/northbeck/desk");
    await s.page.goto("/northbeck/desk");
    const rows = s.page.locator("tr[data-ticket-id]");
    await rows.first().waitFor({ timeout: 30_000 });
    // Newest first: the first row is the newest open ticket.
    const newest = mustExist(
      await db("tickets").where({ vendor_id: vendor.id }).whereNot("status", "closed").orderBy("created_at", "desc").first("id"),
      "newest",
    );
    await expect(rows.first().getAttribute("data-ticket-id")).resolves.toBe(newest.id);

    await s.page.getByPlaceholder("Ticket number or words").fill(`#${ticket.number}`);
    await expect.poll(() => new URL(s.page.url()).searchParams.get("q"), { timeout: 10_000 }).toBe(`#${ticket.number}`);
    await expect
      .poll(() => rows.evaluateAll((trs) => trs.map((tr) => tr.getAttribute("data-ticket-id"))), { timeout: 20_000 })
      .toEqual([ticket.id]);
    await s.page.locator("select:has(option[value=target])").selectOption("target");
    await screenshot(s.page, "desk-search-by-number");

    await s.page.reload();
    await expect(s.page.getByPlaceholder("Ticket number or words").inputValue()).resolves.toBe(`#${ticket.number}`);
    await expect(s.page.locator("select:has(option[value=target])").inputValue()).resolves.toBe("target");
    await expect(rows.evaluateAll((trs) => trs.map((tr) => tr.getAttribute("data-ticket-id")))).resolves.toEqual([ticket.id]);
  });

  it("pages through a long queue, and the page stays in the address across a reload", async () => {
    const db = e2eDb();
    const vendor = mustExist(await db("vendors").where({ slug: "northbeck" }).first("id"), "vendor");
    const customer = mustExist(await db("users").where({ email: "maker@example.test" }).first("id"), "customer");
    // Tagged so that only they are listed, and a year old so that no other test's "newest" changes.
    await db.raw(
      `insert into tickets (vendor_id, number, customer_id, subject, body, status, priority, tags, idempotency_key, first_response_due_at, created_at, last_activity_at)
       select ?, (select max(number) from tickets where vendor_id = ?) + g, ?, 'Paging check ' || g, 'A question of the paging check.', 'new', 'normal',
              array['paging-check'], 'paging-check-' || g, now(), now() - interval '1 year' + g * interval '1 minute', now()
       from generate_series(1, ?) g`,
      [vendor.id, vendor.id, customer.id, QUEUE_PAGE_SIZE + 3],
    );
    const s = await openBrowser();
    sessions.push(s);
    s.page.setDefaultNavigationTimeout(90_000);
    await signInWithPassword(s.page, "support1@northbeck.test", "/northbeck/desk?tag=paging-check");
    await s.page.goto("/northbeck/desk?tag=paging-check");
    const rows = s.page.locator("tr[data-ticket-id]");
    await rows.first().waitFor({ timeout: 30_000 });
    await expect(rows.count()).resolves.toBe(QUEUE_PAGE_SIZE);
    await expect(rows.first().textContent()).resolves.toContain(`Paging check ${QUEUE_PAGE_SIZE + 3}`);

    await s.page.getByRole("button", { name: "Next page →" }).click();
    await expect.poll(() => new URL(s.page.url()).searchParams.get("page"), { timeout: 10_000 }).toBe("2");
    await expect.poll(() => rows.count(), { timeout: 20_000 }).toBe(3);
    await expect(s.page.getByRole("button", { name: "Next page →" }).isDisabled()).resolves.toBe(true);
    await screenshot(s.page, "desk-queue-page-2");

    await s.page.reload();
    await rows.first().waitFor({ timeout: 30_000 });
    await expect(rows.count()).resolves.toBe(3);
    await expect(rows.last().textContent()).resolves.toContain("Paging check 1");
    await s.page.getByRole("button", { name: "← Previous page" }).click();
    await expect.poll(() => rows.count(), { timeout: 20_000 }).toBe(QUEUE_PAGE_SIZE);
    await expect.poll(() => new URL(s.page.url()).searchParams.get("page")).toBeNull();
  });
});
