import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { openBrowser, screenshot, type Session } from "../support/browser";

// Runs against the demo seed (npm run db:seed -- --reset indexes it too): northbeck's Library is public.
describe("Library search", () => {
  let session: Session;
  beforeAll(async () => {
    session = await openBrowser();
  });
  afterAll(async () => {
    await session.close();
  });

  it("a visitor types “1/8 acrylic slot”, sees the matching sheets first with facet counts and chips, removes a chip, and goes back", async () => {
    const { page } = session;
    const response = await page.goto("/northbeck/library/search");
    expect(response?.status()).toBe(200);
    const box = page.locator("#library-search");
    await box.pressSequentially("1/8 acrylic slot", { delay: 40 });
    await page.waitForURL((url) => url.searchParams.get("q") === "1/8 acrylic slot", { timeout: 30_000 });

    const results = page.getByRole("list", { name: "Matching sheets" }).getByRole("link");
    await expect.poll(() => results.count(), { timeout: 30_000 }).toBe(2);
    const titles = await results.allTextContents();
    expect(titles.length).toBe(2);
    expect(titles.every((t) => t.startsWith("Cast acrylic, 1/8 in"))).toBe(true);
    // Two sheets with the same title are told apart by their machine class.
    const headings = await results.evaluateAll((as) => as.map((a) => a.querySelector("span")?.textContent ?? ""));
    expect(new Set(headings).size).toBe(2);
    // The matched words are marked in the titles.
    await expect
      .poll(() => results.first().locator("mark").allTextContents(), { timeout: 30_000 })
      .toEqual(expect.arrayContaining(["Cast acrylic", "1/8"]));

    const chipList = page.getByRole("list", { name: "Understood parts of the query" }).getByRole("button");
    // Labels use no-break spaces between number and unit.
    const chips = { allTextContents: async () => (await chipList.allTextContents()).map((t) => t.replace(/\s+/g, " ")) };
    expect(await chips.allTextContents()).toEqual(['Ø 3.175 mm (1/8")', "acrylic", "slotting"]);
    const operations = page.locator('[data-facet="operations"]');
    await expect
      .poll(() => operations.getByRole("button", { name: /Slot, full width/ }).textContent(), { timeout: 30_000 })
      .toMatch(/Slot, full width\s*2/);
    await expect
      .poll(() => page.locator('[data-facet="machineClass"]').textContent(), { timeout: 30_000 })
      .toMatch(/Light belt-drive router\s*1.*Rigid ball-screw router\s*1/s);
    await screenshot(page, "search-1-8-acrylic-slot");

    await page.getByRole("button", { name: "Remove slotting" }).click();
    await page.waitForURL((url) => url.searchParams.get("q") === "1/8 acrylic", { timeout: 30_000 });
    await expect.poll(() => box.inputValue(), { timeout: 30_000 }).toBe("1/8 acrylic");
    await expect.poll(() => chips.allTextContents(), { timeout: 30_000 }).toEqual(['Ø 3.175 mm (1/8")', "acrylic"]);
    await screenshot(page, "search-chip-removed");

    await page.goBack();
    await page.waitForURL((url) => url.searchParams.get("q") === "1/8 acrylic slot", { timeout: 30_000 });
    await expect.poll(() => box.inputValue(), { timeout: 30_000 }).toBe("1/8 acrylic slot");
    await expect.poll(() => chips.allTextContents(), { timeout: 30_000 }).toEqual(['Ø 3.175 mm (1/8")', "acrylic", "slotting"]);
  });

  it("results are plain links: Tab and the arrow keys reach them, Enter opens one, a click too", async () => {
    const { page } = session;
    await page.goto(`/northbeck/library/search?q=${encodeURIComponent("6mm mdf profile")}`);
    const box = page.locator("#library-search");
    const links = page.getByRole("list", { name: "Matching sheets" }).getByRole("link");
    await expect.poll(() => links.count(), { timeout: 30_000 }).toBeGreaterThan(0);
    const first = await links.first().getAttribute("href");
    expect(first).toMatch(/^\/northbeck\/library\//);
    await box.focus();
    await page.keyboard.press("ArrowDown");
    await expect(page.evaluate(() => document.activeElement?.getAttribute("href"))).resolves.toBe(first);
    await page.keyboard.press("ArrowUp");
    await expect(page.evaluate(() => document.activeElement?.id)).resolves.toBe("library-search");
    // Tab from the box goes through the hint-free controls to a result link eventually.
    let reached = false;
    for (let i = 0; i < 40 && !reached; i += 1) {
      await page.keyboard.press("Tab");
      reached = (await page.evaluate(() => document.activeElement?.hasAttribute("data-search-hit") ?? false)) === true;
    }
    expect(reached).toBe(true);
    await links.first().focus();
    await page.keyboard.press("Enter");
    await page.waitForURL((url) => url.pathname === first, { timeout: 60_000 });
    await page.goBack();
    await links.first().waitFor({ timeout: 30_000 });
    await links.first().click();
    await page.waitForURL((url) => url.pathname === first, { timeout: 60_000 });
  });

  it("an empty result offers looser queries", async () => {
    const { page } = session;
    // The only glass-epoxy sheet is withdrawn, so nothing matches even with the diameter dropped.
    await page.goto(`/northbeck/library/search?q=${encodeURIComponent("1/8 glass epoxy")}`);
    await expect.poll(() => page.getByText("No published sheet matches this search.").count(), { timeout: 30_000 }).toBe(1);
    await page.getByRole("button", { name: "1/8 composites" }).click();
    await page.waitForURL((url) => url.searchParams.get("q") === "1/8 composites", { timeout: 30_000 });
    await screenshot(page, "search-empty");
  });

  it("the shell search box opens the search page", async () => {
    const { page } = session;
    await page.goto("/northbeck/library");
    await page.locator("#shell-search").fill("plexi");
    await page.locator("#shell-search").press("Enter");
    await page.waitForURL((url) => url.pathname === "/northbeck/library/search" && url.searchParams.get("q") === "plexi", {
      timeout: 30_000,
    });
    await expect.poll(() => page.getByRole("list", { name: "Matching sheets" }).getByRole("link").count(), { timeout: 30_000 }).toBe(3);
  });
});
