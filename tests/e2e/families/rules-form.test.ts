import { randomBytes } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";

import { holdScripts, openBrowser, type Session } from "../support/browser";
import { signInWithPassword } from "../support/sign-in";

const VENDOR = "northbeck";
const rulesBox = (s: Session) => s.page.getByLabel(/^Rules \(version/);

describe("family forms keep what the engineer typed", () => {
  const sessions: Session[] = [];
  afterAll(async () => {
    for (const s of sessions) await s.close();
  });

  it("a refused family or rules form shows the typed values again, and rules typed before the page hydrated are the ones saved", async () => {
    const tag = randomBytes(2).toString("hex");
    const slug = `e2e-kept-${tag}`;
    const s = await openBrowser();
    sessions.push(s);
    const p = s.page;
    p.setDefaultNavigationTimeout(90_000);
    await signInWithPassword(p, "eng1@northbeck.test", `/${VENDOR}/drafting`);

    // A slug with capitals is refused; every field, ticked boxes too, comes back as typed.
    await p.goto(`/${VENDOR}/drafting/families/new`);
    await p.waitForLoadState("networkidle");
    await p.locator("#f-name").fill(`Kept values ${tag}`);
    await p.locator("#f-slug").fill(`Bad Slug ${tag}`);
    await p.locator("#f-series").fill("NB-2F-");
    await p.locator("#f-diameterMinMm").fill("3");
    await p.getByLabel("Polycarbonate", { exact: true }).check();
    await p.getByLabel("Light belt-drive router").check();
    await p.getByLabel("Rigid ball-screw router").check();
    await p.getByRole("button", { name: "Create family" }).click();
    await p.getByText("Please correct the marked fields.").waitFor({ timeout: 60_000 });
    await expect(p.locator("#f-name").inputValue()).resolves.toBe(`Kept values ${tag}`);
    await expect(p.locator("#f-slug").inputValue()).resolves.toBe(`Bad Slug ${tag}`);
    await expect(p.locator("#f-series").inputValue()).resolves.toBe("NB-2F-");
    await expect(p.locator("#f-diameterMinMm").inputValue()).resolves.toBe("3");
    await expect(p.getByLabel("Polycarbonate", { exact: true }).isChecked()).resolves.toBe(true);
    await expect(p.getByLabel("Light belt-drive router").isChecked()).resolves.toBe(true);
    await expect(p.getByLabel("Rigid ball-screw router").isChecked()).resolves.toBe(true);

    await p.locator("#f-slug").fill(slug);
    await Promise.all([
      p.waitForURL(new RegExp(`/families/${slug}$`), { timeout: 60_000 }),
      p.getByRole("button", { name: "Create family" }).click(),
    ]);

    // Rules out of range are refused; the typed rules and note stay for the engineer to correct.
    const outOfRange = "kinds: [slotting]\nrules:\n  - materialGroup: plastics\n    kind: slotting\n    vcPosition: 7\n";
    await rulesBox(s).fill(outOfRange);
    await p.getByLabel("What changes").fill("Faster slots.");
    await p.getByRole("button", { name: "Save as a new rules version" }).click();
    await p.getByText("Too big").waitFor({ timeout: 60_000 });
    await expect(rulesBox(s).inputValue()).resolves.toBe(outOfRange);
    await expect(p.getByLabel("What changes").inputValue()).resolves.toBe("Faster slots.");

    // Corrected and saved: the new version's rules show, and the refused try's note is gone.
    await rulesBox(s).fill(outOfRange.replace("vcPosition: 7", "vcPosition: 0.6"));
    await Promise.all([
      p.waitForURL(new RegExp(`\\?saved=2$`), { timeout: 60_000 }),
      p.getByRole("button", { name: "Save as a new rules version" }).click(),
    ]);
    await p.getByText("Rules (version 2)").waitFor({ timeout: 60_000 });
    await expect(rulesBox(s).inputValue()).resolves.toContain("vcPosition: 0.6");
    await expect(p.getByLabel("What changes").inputValue()).resolves.toBe("");

    // Typed while the page's scripts are still loading: hydration keeps the text, and it is what gets saved.
    const held = await holdScripts(p);
    await p.goto(`/${VENDOR}/drafting/families/${slug}`, { waitUntil: "domcontentloaded" });
    const early = outOfRange.replace("vcPosition: 7", "vcPosition: 0.4");
    await rulesBox(s).fill(early);
    await p.getByLabel("What changes").fill("Slots a little faster.");
    await held.release();
    await p.waitForLoadState("networkidle", { timeout: 60_000 });
    await expect(rulesBox(s).inputValue()).resolves.toBe(early);
    await Promise.all([
      p.waitForURL(new RegExp(`\\?saved=3$`), { timeout: 60_000 }),
      p.getByRole("button", { name: "Save as a new rules version" }).click(),
    ]);
    await p.getByText("Rules (version 3)").waitFor({ timeout: 60_000 });
    await expect(rulesBox(s).inputValue()).resolves.toContain("vcPosition: 0.4");
  });
});
