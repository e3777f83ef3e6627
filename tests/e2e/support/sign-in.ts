import type { Page } from "playwright-core";

import { screenshot } from "./browser";
import { DEMO_PASSWORD } from "./env";

/** Sign in through the real form, then wait until the app shows the landing page. */
export async function signInWithPassword(page: Page, email: string, callbackUrl = "/", password = DEMO_PASSWORD): Promise<void> {
  await page.goto(`/sign-in?callbackUrl=${encodeURIComponent(callbackUrl)}`);
  await page.locator("#pw-email").fill(email);
  await page.locator("#pw-password").fill(password);
  await Promise.all([
    page.waitForURL((url) => !url.pathname.startsWith("/sign-in"), { timeout: 30_000 }),
    page.getByRole("button", { name: "Sign in", exact: true }).click(),
  ]);
  await screenshot(page, `signed-in-${email}`);
}
