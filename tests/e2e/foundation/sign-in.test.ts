import { afterEach, describe, expect, it } from "vitest";

import { openBrowser, screenshot, type Session } from "../support/browser";
import { BASE_URL } from "../support/env";
import { firstLink, waitForMail } from "../support/maildev";
import { signInWithPassword } from "../support/sign-in";

describe("sign-in", () => {
  let session: Session | undefined;
  afterEach(async () => {
    await session?.close();
    session = undefined;
  });

  it("signs in with e-mail and password and shows the person in the vendor header", async () => {
    session = await openBrowser();
    await signInWithPassword(session.page, "eng1@northbeck.test", "/northbeck/drafting");
    expect(new URL(session.page.url()).pathname).toBe("/northbeck/drafting");
    await expect(session.page.getByRole("banner").textContent()).resolves.toContain("Tobias Rendell");
  });

  it("says so when the password is wrong, with no stack trace", async () => {
    session = await openBrowser();
    const { page } = session;
    await page.goto("/sign-in");
    await page.locator("#pw-email").fill("eng1@northbeck.test");
    await page.locator("#pw-password").fill("not-the-password");
    await page.getByRole("button", { name: "Sign in", exact: true }).click();
    await expect(page.locator("form [role=alert]").textContent({ timeout: 15_000 })).resolves.toContain("E-mail or password is not right");
    await screenshot(page, "sign-in-wrong-password");
  });

  it("shows field errors from the same schema in the browser", async () => {
    session = await openBrowser();
    const { page } = session;
    await page.goto("/sign-in");
    await page.locator("#pw-email").fill("not-an-email");
    await page.getByRole("button", { name: "Sign in", exact: true }).click();
    await expect(page.locator("#pw-email-error").textContent()).resolves.toContain("valid e-mail");
  });

  it("signs in with a magic link read from the mail inbox", async () => {
    session = await openBrowser();
    const { page } = session;
    const started = Date.now();
    await page.goto("/sign-in?callbackUrl=/northbeck/desk");
    await page.locator("#ml-email").fill("support1@northbeck.test");
    await page.getByRole("button", { name: "E-mail me a sign-in link" }).click();
    await page.waitForURL(/\/sign-in\/check-mail/);
    await screenshot(page, "magic-link-check-mail");
    const mail = await waitForMail("support1@northbeck.test", /sign-in link/, { after: started - 1000 });
    await page.goto(firstLink(mail.text, /\/api\/auth\/callback\/email/));
    await page.waitForURL(/\/northbeck\/desk/);
    await expect(page.getByRole("banner").textContent()).resolves.toContain("Dev Kapoor");
    await screenshot(page, "magic-link-signed-in");
  });

  it("stays on the site after signing in, whatever the callback says", async () => {
    session = await openBrowser();
    const { page } = session;
    for (const callbackUrl of ["/\\evil.example", "/\t/evil.example", "https://evil.example/"]) {
      await signInWithPassword(page, "maker@example.test", callbackUrl);
      const landed = new URL(page.url());
      expect(landed.origin).toBe(new URL(BASE_URL).origin);
      expect(landed.pathname).toBe("/");
      await page.context().clearCookies();
    }
  });
});
