import { randomBytes } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";

import { holdScripts, openBrowser, type Session } from "../support/browser";
import { signInWithPassword } from "../support/sign-in";

describe("the sheet editor before it hydrates", () => {
  const sessions: Session[] = [];
  afterAll(async () => {
    for (const s of sessions) await s.close();
  });

  it("keeps source and change note typed while its scripts load, and autosaves that source", async () => {
    const slug = `e2e-early-${randomBytes(3).toString("hex")}`;
    const sheetPath = `/northbeck/drafting/sheets/${slug}`;
    const s = await openBrowser();
    sessions.push(s);
    const p = s.page;
    p.setDefaultNavigationTimeout(90_000);
    await signInWithPassword(p, "eng1@northbeck.test", "/northbeck/drafting");
    await p.goto("/northbeck/drafting/sheets/new");
    await p.waitForLoadState("networkidle");
    await p.locator("#cutterId").selectOption({ label: "NB-2F-6 · 6 mm two-flute up-cut end mill" });
    await p.locator("#materialId").selectOption({ label: "MDF" });
    await p.locator("#machineClassId").selectOption({ label: "Light belt-drive router" });
    await p.locator("#slug").fill(slug);
    await Promise.all([
      p.waitForURL(`**${sheetPath}/edit`, { timeout: 90_000, waitUntil: "commit" }),
      p.getByRole("button", { name: "Create the draft" }).click(),
    ]);
    await p.locator('[data-editor][data-status="saved"]').waitFor({ timeout: 60_000 });

    const held = await holdScripts(p);
    await p.goto(`${sheetPath}/edit`, { waitUntil: "domcontentloaded" });
    const source = p.locator("#sheet-source");
    const typed = `${await source.inputValue()}\nA line typed before the editor was ready.\n`;
    await source.fill(typed);
    await p.locator("#change-note").fill("Typed early.");
    await held.release();
    await p.waitForLoadState("networkidle", { timeout: 60_000 });
    await expect(source.inputValue()).resolves.toBe(typed);
    await expect(p.locator("#change-note").inputValue()).resolves.toBe("Typed early.");

    // The kept text differs from the saved draft, so the editor autosaves it.
    await p.locator('[data-editor][data-status="saved"]').waitFor({ timeout: 60_000 });
    await p.reload();
    await expect(p.locator("#sheet-source").inputValue()).resolves.toContain("A line typed before the editor was ready.");
  });
});
