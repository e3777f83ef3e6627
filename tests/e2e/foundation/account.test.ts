import { randomBytes } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";

import { openBrowser, screenshot, type Session } from "../support/browser";
import { firstLink, waitForMail } from "../support/maildev";
import { signInWithPassword } from "../support/sign-in";

describe("your account", () => {
  const sessions: Session[] = [];
  afterAll(async () => {
    for (const s of sessions) await s.close();
  });

  it(
    "a customer changes the password from the header; the old session ends and the new password signs in",
    { timeout: 240_000 },
    async () => {
      const email = `account-${randomBytes(3).toString("hex")}@example.test`;
      const started = Date.now();
      const person = await openBrowser();
      sessions.push(person);
      const { page } = person;
      page.setDefaultNavigationTimeout(90_000);
      await page.goto("/quillon/sign-up");
      await page.getByLabel("Your name").fill("Account Journey");
      await page.getByLabel("E-mail").fill(email);
      await page.getByLabel("Password").fill("first-password-1");
      await page.getByRole("button", { name: "Create account" }).click();
      await expect(page.getByRole("status").textContent({ timeout: 15_000 })).resolves.toContain("we sent a link");
      const confirm = await waitForMail(email, /Confirm your e-mail/, { after: started - 1000 });
      await page.goto(firstLink(confirm.text, /\/verify-email\?/));
      await page.getByLabel("Password").fill("first-password-1");
      await page.getByRole("button", { name: "Confirm my e-mail" }).click();
      await expect(page.getByRole("status").textContent({ timeout: 15_000 })).resolves.toContain("confirmed");

      await signInWithPassword(page, email, "/quillon/library", "first-password-1");
      await page.getByRole("link", { name: "Your account" }).click();
      await page.waitForURL(/\/account$/);
      await page.getByText("Quillon").first().waitFor();
      await page.getByLabel("Current password").fill("not-the-password");
      await page.getByLabel("New password", { exact: true }).fill("second-password-2");
      await page.getByLabel("New password again").fill("second-password-2");
      await page.getByRole("button", { name: "Change password" }).click();
      await expect(page.getByText("The current password is not right.").first().textContent({ timeout: 15_000 })).resolves.toBeTruthy();

      await page.getByLabel("Current password").fill("first-password-1");
      await page.getByLabel("New password", { exact: true }).fill("second-password-2");
      await page.getByLabel("New password again").fill("second-password-2");
      await page.getByRole("button", { name: "Change password" }).click();
      await expect(page.getByRole("status").textContent({ timeout: 15_000 })).resolves.toContain("Password changed");
      await screenshot(page, "account-password-changed");

      // The session that changed it has ended too; the new password signs in.
      await page.goto("/account");
      await page.waitForURL(/\/sign-in/);
      await signInWithPassword(page, email, "/account", "second-password-2");
      expect(new URL(page.url()).pathname).toBe("/account");
    },
  );
});
