import { randomBytes } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";

import { LATEST_THREAD_MESSAGES } from "@/content-schema/api-queries";
import { mustExist } from "@/tests/support/must-exist";

import { openBrowser, screenshot, type Session } from "./browser";
import { closeE2eDb, e2eDb } from "./db";
import { signInWithPassword } from "./sign-in";

const CUSTOMER = "maker@example.test";
const AGENT = "support1@northbeck.test";
const EARLIER = 15;
const LONG = LATEST_THREAD_MESSAGES + EARLIER;

// Setup only: a ticket with a long thread, written straight to the database (the journey test covers how replies get there).
async function insertLongThread(tag: string) {
  const db = e2eDb();
  const vendor = mustExist(await db("vendors").where({ slug: "northbeck" }).first("id"), "vendor");
  const customer = mustExist(await db("users").where({ email: CUSTOMER }).first("id"), "customer");
  const agent = mustExist(await db("users").where({ email: AGENT }).first("id"), "agent");
  const { next } = mustExist(
    await db("tickets").where({ vendor_id: vendor.id }).first<{ next: number }>(db.raw("coalesce(max(number), 0) + 1 as next")),
    "next",
  );
  const start = Date.now() - LONG * 60_000;
  const [ticket] = await db("tickets")
    .insert({
      vendor_id: vendor.id,
      number: next,
      customer_id: customer.id,
      subject: `Long thread ${tag}`,
      body: `The question of ${tag}: the spindle stalls in the ramp.`,
      idempotency_key: tag,
      first_response_due_at: new Date(start + 3_600_000),
      created_at: new Date(start),
      updated_at: new Date(),
      last_activity_at: new Date(),
    })
    .returning<{ id: string }[]>("id");
  // Position 2 is an internal note, so the customer has one message fewer.
  await db("ticket_messages").insert(
    Array.from({ length: LONG }, (_, i) => ({
      vendor_id: vendor.id,
      ticket_id: ticket.id,
      author_id: i % 2 ? agent.id : customer.id,
      visibility: i === 1 ? "note" : "public",
      body: `${tag} message ${i + 1}`,
      created_at: new Date(start + (i + 1) * 60_000),
    })),
  );
  return ticket.id;
}

describe("a long ticket thread", () => {
  const sessions: Session[] = [];
  afterAll(async () => {
    for (const s of sessions) await s.close();
    await closeE2eDb();
  });

  it("shows the question and the latest messages, and unfolds the rest by a plain link", { timeout: 240_000 }, async () => {
    const tag = `t${randomBytes(3).toString("hex")}`;
    const ticketId = await insertLongThread(tag);
    const message = (n: number) => `${tag} message ${n}`;

    const s = await openBrowser();
    sessions.push(s);
    s.page.setDefaultNavigationTimeout(90_000);
    await signInWithPassword(s.page, AGENT);
    const deskPath = `/northbeck/desk/tickets/${ticketId}`;
    await s.page.goto(deskPath);
    await s.page.getByText(`The question of ${tag}`).waitFor({ timeout: 30_000 });
    await expect(s.page.getByText(message(LONG), { exact: true }).count()).resolves.toBe(1);
    await expect(s.page.getByText(message(EARLIER + 1), { exact: true }).count()).resolves.toBe(1);
    await expect(s.page.getByText(message(EARLIER), { exact: true }).count()).resolves.toBe(0);
    await expect(s.page.locator("[data-thread-fold]").textContent()).resolves.toContain(`${EARLIER} earlier messages folded away`);
    await screenshot(s.page, "desk-long-thread-folded");

    // Unfolded, the page keeps asking for the whole thread while it polls.
    const polled = s.page.waitForRequest((r) => r.url().includes(`/tickets/${ticketId}?messages=all`), { timeout: 60_000 });
    await Promise.all([s.page.waitForURL(/messages=all/), s.page.getByRole("link", { name: `Unfold all ${LONG}` }).click()]);
    await s.page.getByText(message(1), { exact: true }).waitFor({ timeout: 30_000 });
    await expect(s.page.locator('[aria-label="Thread"] > li').count()).resolves.toBe(LONG);
    await polled;
    await expect(s.page.getByRole("link", { name: `Fold to the latest ${LATEST_THREAD_MESSAGES}` }).count()).resolves.toBe(1);

    // Without scripts: the server's HTML carries the fold and its link; a value it does not know is the default.
    const html = await (await s.context.request.get(`${deskPath}?messages=everything`)).text();
    expect(html).toContain(`href="${deskPath}?messages=all"`);
    expect(html).not.toContain(`>${message(1)}<`);

    // The customer's page folds the same way, without the note in the count.
    const c = await openBrowser();
    sessions.push(c);
    c.page.setDefaultNavigationTimeout(90_000);
    await signInWithPassword(c.page, CUSTOMER);
    await c.page.goto(`/northbeck/support/tickets/${ticketId}`);
    await c.page.getByText(`The question of ${tag}`).waitFor({ timeout: 30_000 });
    await expect(c.page.locator("[data-thread-fold]").textContent()).resolves.toContain(`${EARLIER - 1} earlier messages folded away`);
    await expect(c.page.getByText(message(2), { exact: true }).count()).resolves.toBe(0);
    await screenshot(c.page, "support-long-thread-folded");
  });
});
