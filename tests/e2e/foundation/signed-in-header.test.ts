import { afterAll, describe, expect, it } from "vitest";

import { openBrowser, screenshot, type Session } from "../support/browser";
import { closeE2eDb } from "../support/db";
import { signInWithPassword } from "../support/sign-in";

describe("one signed-in header everywhere", () => {
  const sessions: Session[] = [];
  afterAll(async () => {
    for (const s of sessions) await s.close();
    await closeE2eDb();
  });

  it("the platform home shows who is signed in; a skip link leads to the content", async () => {
    const c = await openBrowser();
    sessions.push(c);
    await signInWithPassword(c.page, "maker@example.test", "/");
    await c.page.goto("/");
    const account = c.page.locator("[data-account]");
    await expect(account.textContent()).resolves.toContain("Riley Okafor");
    await expect(account.getByRole("button", { name: "Sign out" }).count()).resolves.toBe(1);
    await expect(account.getByRole("link", { name: "Sign in" }).count()).resolves.toBe(0);
    // The first Tab lands on the skip link, which targets the main content.
    await c.page.keyboard.press("Tab");
    await expect(c.page.evaluate(() => document.activeElement?.textContent)).resolves.toBe("Skip to the content");
    await expect(c.page.evaluate(() => (document.activeElement as HTMLAnchorElement).hash)).resolves.toBe("#main");
    await expect(c.page.locator("main#main").count()).resolves.toBe(1);
  });

  it("a customer of one vendor opening another's customers-only Library is told why and offered to join (still a 404)", async () => {
    const c = sessions[0];
    const response = await c.page.goto("/quillon/library");
    expect(response?.status()).toBe(404);
    await c.page.getByRole("heading", { name: /This Library is for .+ customers/ }).waitFor();
    const join = c.page.getByRole("link", { name: /^Ask to join/ });
    await expect(join.getAttribute("href")).resolves.toBe("/quillon/sign-up");
    await screenshot(c.page, "private-library-explained");
  });

  it("the operator console has the header with sign-out", async () => {
    const o = await openBrowser();
    sessions.push(o);
    await signInWithPassword(o.page, "operator@swarfbook.test", "/operator");
    await o.page.goto("/operator");
    const account = o.page.locator("header[data-shell] [data-account]");
    await account.getByRole("button", { name: "Sign out" }).waitFor();
    await expect(o.page.locator("main#main h1").textContent()).resolves.toBe("Operator");
    await screenshot(o.page, "operator-header");
  });
});
