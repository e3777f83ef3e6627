import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import type { Page } from "playwright-core";
import { afterAll, describe, expect, it } from "vitest";

import { openBrowser, screenshot, type Session } from "../support/browser";
import { closeE2eDb, e2eDb } from "../support/db";
import { signInWithPassword } from "../support/sign-in";

const CUSTOMER = "maker@example.test";
const VENDOR = "northbeck";

/** The page fits the screen: nothing pans sideways (a wide table scrolls inside its own box). */
async function expectNoSidewaysPan(page: Page, what: string) {
  const { scrollWidth, innerWidth } = await page.evaluate(() => ({
    scrollWidth: document.documentElement.scrollWidth,
    innerWidth: window.innerWidth,
  }));
  expect(scrollWidth, `${what} is ${scrollWidth} px wide on a ${innerWidth} px screen`).toBeLessThanOrEqual(innerWidth);
}

async function publishedSheetSlug(): Promise<string> {
  const row = await e2eDb()("sheet_versions as v")
    .join("sheets as s", "s.id", "v.sheet_id")
    .join("vendors as d", "d.id", "v.vendor_id")
    .where({ "d.slug": VENDOR, "v.state": "published" })
    .orderBy("s.slug")
    .first<{ slug: string }>("s.slug");
  return row.slug;
}

describe.each([
  { name: "phone", viewport: { width: 390, height: 844 } },
  { name: "tablet", viewport: { width: 820, height: 1180 } },
])("customer's adapt → save → print path on a $name", ({ name, viewport }) => {
  const sessions: Session[] = [];
  afterAll(async () => {
    for (const s of sessions) await s.close();
    await closeE2eDb();
  });

  it(
    "every customer page fits the screen; the setup prints; a question about the sheet starts prefilled",
    { timeout: 360_000 },
    async () => {
      const slug = await publishedSheetSlug();
      const c = await openBrowser({ viewport });
      sessions.push(c);
      c.page.setDefaultNavigationTimeout(90_000);
      c.page.setDefaultTimeout(45_000);
      await signInWithPassword(c.page, CUSTOMER, `/${VENDOR}/library`);

      for (const route of [
        `/${VENDOR}/library`,
        `/${VENDOR}/library/search?q=acrylic`,
        `/${VENDOR}/bench`,
        `/${VENDOR}/support`,
        `/${VENDOR}/support/new`,
        `/${VENDOR}/bench/machines/new`,
      ]) {
        await c.page.goto(route);
        await expectNoSidewaysPan(c.page, route);
      }
      await screenshot(c.page, `${name}-bench-machine-form`);

      // Adapt the sheet to the customer's saved machine; the results table stays inside the screen.
      await c.page.goto(`/${VENDOR}/library/${slug}`);
      const panel = c.page.locator("[data-adapt-panel]");
      await panel.waitFor({ timeout: 60_000 });
      await panel.getByTestId("adapted-n").waitFor();
      await expect.poll(() => panel.getByTestId("adapted-n").textContent(), { timeout: 15_000 }).toMatch(/\d/);
      await expectNoSidewaysPan(c.page, "the sheet with its adapt panel");
      await screenshot(c.page, `${name}-sheet-adapted`);

      await panel.getByRole("button", { name: "Save as a setup" }).click();
      const open = panel.getByRole("link", { name: "Open the setup" });
      await open.waitFor({ timeout: 30_000 });
      await Promise.all([c.page.waitForURL(/\/bench\/setups\//, { timeout: 60_000 }), open.click()]);
      await c.page.getByRole("heading", { name: "Numbers on this machine" }).waitFor();
      await expectNoSidewaysPan(c.page, "the setup page");
      // The setup says what the customer changed, the stick-out and the entry, on the page and in print.
      await c.page.locator("[data-your-changes]").waitFor();
      await expect(c.page.locator("[data-setup-facts]").textContent()).resolves.toMatch(/Stick-out.+Entry/);
      await screenshot(c.page, `${name}-setup`);

      // Print: the setup sheet downloads as a PDF.
      const [download] = await Promise.all([
        c.page.waitForEvent("download", { timeout: 60_000 }),
        c.page.getByRole("link", { name: "Setup sheet (PDF)" }).click(),
      ]);
      const dir = mkdtempSync(path.join(tmpdir(), `${name}-pdf-`));
      try {
        const file = path.join(dir, "setup.pdf");
        await download.saveAs(file);
        expect(readFileSync(file).subarray(0, 5).toString()).toBe("%PDF-");
        const text = execFileSync("pdftotext", ["-layout", file, "-"]).toString();
        expect(text).toMatch(/rpm/);
        expect(text).toContain("Your changes");
        expect(text).toContain("Stick-out:");
        expect(text).toContain("Entry:");
      } finally {
        rmSync(dir, { recursive: true, force: true });
      }

      // Ask about the sheet from the setup: the new ticket names the version and the machine.
      const setupId = new URL(c.page.url()).pathname.split("/").pop() ?? "";
      const { name: machineName } = await e2eDb()("setups as st")
        .join("machines as m", "m.id", "st.machine_id")
        .where("st.id", setupId)
        .first<{ name: string }>("m.name");
      await Promise.all([
        c.page.waitForURL(/\/support\/new\?/, { timeout: 60_000 }),
        c.page.getByRole("link", { name: /^Ask .+ about this sheet$/ }).click(),
      ]);
      await c.page.getByText("About the sheet").waitFor();
      const chosen = await c.page.locator('select[name="machineId"] option:checked').textContent();
      expect(chosen).toBe(machineName);
      await expectNoSidewaysPan(c.page, "the new ticket form");
      await screenshot(c.page, `${name}-ask-from-setup`);

      // And from the sheet page: the version and the customer's machine are filled in.
      await c.page.goto(`/${VENDOR}/library/${slug}`);
      await Promise.all([
        c.page.waitForURL(/\/support\/new\?/, { timeout: 60_000 }),
        c.page.getByRole("link", { name: /^Ask .+ about this sheet$/ }).click(),
      ]);
      await c.page.getByText("About the sheet").waitFor();
      await expect(c.page.locator('select[name="machineId"]').inputValue()).resolves.not.toBe("");
    },
  );
});
