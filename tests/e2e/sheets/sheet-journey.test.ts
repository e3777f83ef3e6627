import { randomBytes } from "node:crypto";
import type { Page } from "playwright-core";
import { afterAll, describe, expect, it } from "vitest";

import { openBrowser, screenshot, type Session } from "../support/browser";
import { closeE2eDb } from "../support/db";
import { signInWithPassword } from "../support/sign-in";

const AUTHOR = "eng1@northbeck.test";
const REVIEWER = "eng2@northbeck.test";
const CUSTOMER = "maker@example.test";

/** The dev server can be slow under load; one more try before failing. */
async function signIn(page: Page, email: string, callbackUrl: string) {
  try {
    await signInWithPassword(page, email, callbackUrl);
  } catch {
    // Under load the landing page can be slow to fire "load"; what matters is the session cookie.
    const cookies = await page.context().cookies();
    if (!cookies.some((c) => c.name.includes("session-token"))) await signInWithPassword(page, email, callbackUrl);
  }
}

const source = (page: Page) => page.locator("#sheet-source");

/** Replaces the first `vf:` of the source (the first operation's feed) and waits for the preview check. */
async function setFirstFeed(page: Page, feed: string) {
  await source(page).waitFor({ timeout: 60_000 });
  const text = await source(page).inputValue();
  await source(page).fill(text.replace(/vf: [^\n]+/, `vf: ${feed}`));
}

async function waitSaved(page: Page) {
  await page.locator('[data-editor][data-status="saved"]').waitFor({ timeout: 60_000 });
}

async function submitForReview(page: Page, note: string) {
  await page.getByText("No problems found.").waitFor({ timeout: 60_000 });
  await waitSaved(page);
  await page.locator("#change-note").fill(note);
  await Promise.all([
    page.waitForURL((u) => !u.pathname.endsWith("/edit"), { timeout: 90_000, waitUntil: "commit" }),
    page.getByRole("button", { name: "Submit for review" }).click(),
  ]);
  await page.getByText("In review").first().waitFor({ timeout: 45_000 });
}

async function approveAndPublish(page: Page, sheetPath: string, number: number) {
  await page.goto(sheetPath);
  // The reviewer sees what they approve: the version rendered with its operations table, and for later versions the diff.
  await page.locator("[data-review] [data-preview] table").waitFor({ timeout: 45_000 });
  await expect(page.locator("[data-review] [data-testid=parameter-diff]").count()).resolves.toBe(number > 1 ? 1 : 0);
  await page.getByRole("button", { name: "Approve" }).click();
  await page.getByText("approved by").waitFor({ timeout: 45_000 });
  await screenshot(page, `sheet-approved-v${number}`);
  // Publishing asks first; cancelling leaves the version in review.
  await page.getByRole("button", { name: `Publish version ${number}` }).click();
  await page.getByRole("button", { name: "Cancel" }).click();
  await page.getByRole("button", { name: `Publish version ${number}` }).click();
  await screenshot(page, `sheet-publish-confirm-v${number}`);
  await page.getByRole("button", { name: `Yes, publish version ${number}` }).click();
  // Published when the sheet has no open draft any more.
  await page.getByRole("button", { name: "Start a new version" }).waitFor({ timeout: 60_000 });
  await screenshot(page, `sheet-published-v${number}`);
}

describe("recipe sheet journey", () => {
  const sessions: Session[] = [];
  afterAll(async () => {
    for (const s of sessions) await s.close();
    await closeE2eDb();
  });

  it("draft with a schema error → fixed → submitted → approved and published by a second engineer → read by a customer → v2 with a changed feed shows exactly that change", async () => {
    const slug = `e2e-mdf-${randomBytes(3).toString("hex")}`;
    const sheetPath = `/northbeck/drafting/sheets/${slug}`;

    // The author starts a sheet from the catalogue.
    const a = await openBrowser();
    sessions.push(a);
    a.page.setDefaultTimeout(60_000);
    await signIn(a.page, AUTHOR, "/northbeck/drafting");
    await a.page.goto("/northbeck/drafting/sheets/new");
    await a.page.locator("#cutterId").selectOption({ label: "NB-2F-6 · 6 mm two-flute up-cut end mill" });
    await a.page.locator("#materialId").selectOption({ label: "MDF" });
    await a.page.locator("#machineClassId").selectOption({ label: "Light belt-drive router" });
    await a.page.locator("#slug").fill(slug);
    await screenshot(a.page, "new-sheet-form");
    await Promise.all([
      a.page.waitForURL(`**${sheetPath}/edit`, { timeout: 90_000, waitUntil: "commit" }),
      a.page.getByRole("button", { name: "Create the draft" }).click(),
    ]);

    // A feed without its unit: the problem list names the line, and clicking it selects that line.
    await setFirstFeed(a.page, "1800");
    const expectedLine = (await source(a.page).inputValue()).split("\n").findIndex((l) => l.startsWith("    vf: 1800")) + 1;
    const issue = a.page.locator(`button[data-line="${expectedLine}"]`);
    await issue.waitFor({ timeout: 60_000 });
    expect(await issue.textContent()).toContain("with its unit");
    await screenshot(a.page, "editor-schema-error");
    await issue.click();
    const selected = await source(a.page).evaluate((el: HTMLTextAreaElement) => el.value.slice(el.selectionStart, el.selectionEnd));
    expect(selected.trim()).toBe("vf: 1800");
    await expect(a.page.getByRole("button", { name: "Submit for review" }).isDisabled()).resolves.toBe(true);

    // Fixed: the preview renders with the same components as the Library.
    await setFirstFeed(a.page, "1800 mm/min");
    await a.page.locator("[data-preview] table").waitFor({ timeout: 60_000 });
    await screenshot(a.page, "editor-fixed-preview");
    await submitForReview(a.page, "First version, from test cuts on the reference router.");
    await screenshot(a.page, "sheet-in-review");

    // The author is not offered Approve; a second engineer approves and publishes.
    await a.page.getByText("another engineer reviews and approves it").waitFor({ timeout: 45_000 });
    await expect(a.page.getByRole("button", { name: "Approve" }).count()).resolves.toBe(0);
    await screenshot(a.page, "author-cannot-approve");
    const r = await openBrowser();
    sessions.push(r);
    r.page.setDefaultTimeout(60_000);
    await signIn(r.page, REVIEWER, "/northbeck/drafting");
    await approveAndPublish(r.page, sheetPath, 1);

    // A customer reads it in the Library, and can switch to imperial units.
    const c = await openBrowser({ viewport: { width: 1024, height: 1366 } });
    sessions.push(c);
    c.page.setDefaultTimeout(60_000);
    await signIn(c.page, CUSTOMER, "/northbeck/library");
    await c.page.goto(`/northbeck/library/${slug}`);
    const firstRow = c.page.locator("#operations tbody tr").first();
    await expect(firstRow.textContent()).resolves.toContain("1800\u00a0mm/min");
    await c.page.locator("#adapt").waitFor();
    await screenshot(c.page, "library-sheet-v1");
    await c.page.getByRole("button", { name: "Imperial (in)" }).click();
    await c.page.locator('table[data-units="imperial"]').first().waitFor({ timeout: 45_000 });
    await expect(c.page.locator("#operations tbody tr").first().textContent()).resolves.toContain("70.9\u00a0in/min");
    await screenshot(c.page, "library-sheet-v1-imperial");

    // Version 2 lowers the first operation's feed; the diff shows that change and nothing else.
    await a.page.goto(sheetPath);
    await Promise.all([
      a.page.waitForURL(`**${sheetPath}/edit`, { timeout: 90_000, waitUntil: "commit" }),
      a.page.getByRole("button", { name: "Start a new version" }).click(),
    ]);
    await setFirstFeed(a.page, "1620 mm/min");
    await submitForReview(a.page, "Feed lowered 10 % after chatter reports.");
    await approveAndPublish(r.page, sheetPath, 2);
    await r.page.goto(`${sheetPath}/diff?from=1&to=2`);
    const changed = r.page.locator("[data-testid=parameter-diff] tr[data-parameter]");
    await expect(changed.evaluateAll((rows) => rows.map((row) => row.getAttribute("data-parameter")))).resolves.toEqual(["vf", "fz"]);
    await expect(changed.first().textContent()).resolves.toContain("-180\u00a0mm/min");
    await expect(changed.first().textContent()).resolves.toContain("-10.0\u00a0%");
    await screenshot(r.page, "diff-v1-v2");

    // The customer's old link now says it is superseded and points to version 2.
    await c.page.goto(`/northbeck/library/${slug}/v/1`);
    await c.page.getByText("Superseded on").waitFor();
    await c.page.getByRole("link", { name: "Read the current version 2" }).waitFor();
    await screenshot(c.page, "library-v1-superseded");
  }, 600_000);
});
