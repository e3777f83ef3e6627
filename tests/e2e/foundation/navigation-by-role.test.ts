import { afterAll, describe, expect, it } from "vitest";

import { openBrowser, screenshot, type Session } from "../support/browser";
import { signInWithPassword } from "../support/sign-in";

const ALL = ["Library", "Bench", "Support", "Drafting", "Desk", "Admin"] as const;

// What each demo person's navigation offers (lib/auth/permissions.ts), and that the rest answers 404.
const CASES = [
  { email: "maker@example.test", allowed: ["Library", "Bench", "Support"] },
  { email: "eng2@northbeck.test", allowed: ["Library", "Bench", "Drafting"] },
  { email: "support2@northbeck.test", allowed: ["Library", "Bench", "Desk"] },
  { email: "admin@northbeck.test", allowed: ["Library", "Bench", "Drafting", "Desk", "Admin"] },
];

describe("navigation by role", () => {
  const sessions: Session[] = [];
  afterAll(async () => {
    for (const s of sessions) await s.close();
  });

  for (const { email, allowed } of CASES) {
    it(`${email} sees ${allowed.join(", ")} and reaches each of them`, async () => {
      const session = await openBrowser();
      sessions.push(session);
      const { page } = session;
      await signInWithPassword(page, email, "/northbeck/library");
      const nav = page.getByRole("navigation", { name: "Areas" });
      const links = await nav.getByRole("link").allTextContents();
      expect(links).toEqual(allowed);
      for (const area of ALL) {
        const response = await page.goto(`/northbeck/${area.toLowerCase()}`);
        if ((allowed as readonly string[]).includes(area)) {
          expect(response?.status(), `${email} → ${area}`).toBe(200);
          await expect(page.getByRole("heading", { level: 1 }).first().textContent()).resolves.toContain(area);
          await screenshot(page, `${email}-${area}`);
        } else {
          expect(response?.status(), `${email} → ${area}`).toBe(404);
        }
      }
    });
  }

  it("a visitor reads the public Library and is sent to sign in elsewhere", async () => {
    const session = await openBrowser();
    sessions.push(session);
    const { page } = session;
    expect((await page.goto("/northbeck/library"))?.status()).toBe(200);
    await page.goto("/northbeck/bench");
    expect(new URL(page.url()).pathname).toBe("/sign-in");
    await page.goto("/quillon/library");
    expect(new URL(page.url()).pathname).toBe("/sign-in");
  });
});
