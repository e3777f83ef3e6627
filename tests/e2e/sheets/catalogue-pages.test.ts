import { randomBytes } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";

import { openBrowser, screenshot, type Session } from "../support/browser";
import { signInWithPassword } from "../support/sign-in";

const ENGINEER = "eng1@northbeck.test";

describe("catalogue, tokens and Library pages", () => {
  let session: Session | undefined;
  afterAll(async () => {
    await session?.close();
  });

  it("an engineer browses the catalogue, imports cutters from CSV with a preview, makes a token; the Library filters by material", async () => {
    session = await openBrowser();
    const { page } = session;
    page.setDefaultTimeout(60_000);
    await signInWithPassword(page, ENGINEER, "/northbeck/drafting").catch(async () => {
      // Under load the landing page can be slow to fire "load"; what matters is the session cookie.
      if (!(await page.context().cookies()).some((c) => c.name.includes("session-token")))
        await signInWithPassword(page, ENGINEER, "/northbeck/drafting");
    });
    for (const [path, name] of [
      ["/northbeck/drafting", "drafting-overview"],
      ["/northbeck/drafting/sheets", "drafting-sheets"],
      ["/northbeck/drafting/cutters", "drafting-cutters"],
      ["/northbeck/drafting/cutters/NB-SF-3175", "drafting-cutter-detail"],
      ["/northbeck/drafting/materials", "drafting-materials"],
      ["/northbeck/drafting/materials/cast-acrylic", "drafting-material-detail"],
      ["/northbeck/drafting/machine-classes", "drafting-machine-classes"],
      ["/northbeck/drafting/machine-classes/light-router", "drafting-machine-class-detail"],
      ["/northbeck/drafting/cutters/new", "drafting-new-cutter"],
    ] as const) {
      const response = await page.goto(path);
      expect(response?.status(), path).toBe(200);
      await screenshot(page, name);
    }

    // The cutter form checks fields in the browser with the same schema as the server.
    await page.locator("#f-sku").fill("X");
    await page.getByRole("button", { name: "Add cutter" }).click();
    await page.locator("#f-sku-error").waitFor();
    await screenshot(page, "drafting-new-cutter-errors");

    // CSV import: a wrong cell is named in the preview; importing only the valid rows shows progress, then the result.
    const sku = `NB-E2E-${randomBytes(2).toString("hex").toUpperCase()}`;
    await page.goto("/northbeck/drafting/cutters/import");
    const csv = `sku,name,diameter_mm,flutes,flute_length_mm,overall_length_mm,shank_mm,geometry\n${sku},E2E cutter,6,2,18,50,6,upcut\n${sku}-B,Bad cutter,6,two,18,50,6,upcut\n`;
    await page.locator("#csv-text").fill(csv);
    await page.getByText("Row 3, flutes:").waitFor();
    await screenshot(page, "cutter-import-preview");
    await page.getByLabel("Import only the rows without errors").check();
    await page.getByRole("button", { name: /^Import 1 cutter/ }).click();
    await page.getByText("Imported 1 cutter(s)").waitFor({ timeout: 30_000 });
    await screenshot(page, "cutter-import-done");

    // A personal access token is shown once.
    await page.goto("/northbeck/tokens");
    await page.locator("#f-name").fill("e2e script");
    await page.getByRole("button", { name: "Create token" }).click();
    const token = await page.locator("[data-token]").inputValue({ timeout: 15_000 });
    expect(token).toMatch(/^sbk_/);
    await screenshot(page, "tokens-created");
    const api = await page.request.get("/api/v1/vendors/northbeck/sheets?material=hdpe", { headers: { authorization: `Bearer ${token}` } });
    expect(api.status()).toBe(200);

    // The Library filtered by material, and a cutter's page.
    await page.goto("/northbeck/library?material=hdpe");
    await screenshot(page, "library-filtered-hdpe");
    const titles = await page.locator("main li a").allTextContents();
    expect(titles.length).toBeGreaterThan(0);
    expect(titles.every((t) => t.startsWith("HDPE"))).toBe(true);
    await page.goto("/northbeck/library/cutters/NB-SF-3175");
    await screenshot(page, "library-cutter-page");
    await page.goto("/northbeck/library/g10-glass-epoxy-nb-2f-6-rigid-router");
    await page.getByText("Withdrawn on").waitFor();
    await screenshot(page, "library-withdrawn-sheet");
  }, 600_000);
});
