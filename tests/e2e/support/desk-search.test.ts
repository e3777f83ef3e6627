import { afterAll, describe, expect, it } from "vitest";

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
});
