import { readFileSync } from "node:fs";
import { afterAll, describe, expect, it } from "vitest";

import { mustExist } from "@/tests/support/must-exist";

import { openBrowser, screenshot, type Session } from "../support/browser";
import { closeE2eDb, e2eDb } from "../support/db";
import { waitForMail } from "../support/maildev";
import { signInWithPassword } from "../support/sign-in";

const ENGINEER = "eng1@northbeck.test";
const escapeRegExp = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
const VENDOR = "northbeck";

// The two stories the demo seeds tell (seeds/seed-field.ts): the published sheet handed off for chatter,
// and the plastics sheet whose v1 melted and whose v2 fixed it.
async function demoStories() {
  const db = e2eDb();
  const vendor = mustExist(await db("vendors").where({ slug: VENDOR }).first("id"), "vendor");
  const flagged = await db("problem_reports as p")
    .join("sheet_versions as v", "v.id", "p.sheet_version_id")
    .join("sheets as s", "s.id", "v.sheet_id")
    .where({ "p.vendor_id": vendor.id, "p.summary": "ap too deep for light machines" })
    .first("s.slug", "v.title", "v.number");
  const melted = await db("outcomes as o")
    .join("sheet_versions as v", "v.id", "o.sheet_version_id")
    .join("sheets as s", "s.id", "v.sheet_id")
    .where({ "o.vendor_id": vendor.id, "o.symptom": "melting_welding", "v.state": "superseded" })
    .first("s.slug");
  expect(flagged, "demo data: the chatter hand-off").toBeTruthy();
  expect(melted, "demo data: a superseded version that melted").toBeTruthy();
  return { flagged, melted };
}

describe("Field results", () => {
  let session: Session;
  afterAll(async () => {
    await session?.close();
    await closeE2eDb();
  });

  it(
    "an engineer sees the flagged demo sheet, drills into its versions, exports CSV and gets the digest",
    { timeout: 300_000 },
    async () => {
      const { flagged, melted } = await demoStories();
      session = await openBrowser({ viewport: { width: 1280, height: 1400 } });
      const { page } = session;
      page.setDefaultNavigationTimeout(90_000);
      await signInWithPassword(page, ENGINEER, `/${VENDOR}/drafting`);

      await page.goto(`/${VENDOR}/drafting`);
      await page.getByRole("navigation", { name: "Drafting" }).getByRole("link", { name: "Field results" }).click();
      await page.waitForURL(new RegExp(`/${VENDOR}/drafting/field$`));
      const attention = page.getByTestId("needs-attention");
      await attention.waitFor();
      // Other e2e journeys add outcomes too, so the flagged sheet is found by its slug, not by its rank.
      const top = attention.locator(`tbody tr[data-sheet="${flagged.slug}"]`);
      await expect(top.textContent()).resolves.toContain(flagged.title);
      await expect(top.textContent()).resolves.toContain("Chatter");
      // Interval and count stand beside the row: "8 / 18", "25 %–66 %" and the like.
      await expect(top.textContent()).resolves.toMatch(/\d+ \/ \d+/);
      await expect(top.textContent()).resolves.toMatch(/\d+ %–\d+ %/);
      // Ranked by the lower bound of the interval, highest first.
      const bounds = await attention.locator("tbody tr").evaluateAll((rows) => rows.map((r) => Number(r.getAttribute("data-lower-bound"))));
      expect(bounds.length).toBeGreaterThan(1);
      expect(bounds).toEqual([...bounds].sort((x, y) => y - x));
      await expect(page.getByTestId("coverage-gaps").textContent()).resolves.toMatch(
        /machines with max 12,000 rpm, up to 1 kW and a light frame: no class covers them/,
      );
      await expect(page.getByTestId("customer-changes").textContent()).resolves.toMatch(/ap \(axial depth\) lowered by a median of \d+ %/);
      await screenshot(page, "field-results-overview");

      // A coverage gap opens a new machine class prefilled with the cluster's median machine.
      await Promise.all([
        page.waitForURL(/\/drafting\/machine-classes\/new\?/),
        page.getByTestId("coverage-gaps").getByRole("link", { name: "Draft a machine class for them" }).first().click(),
      ]);
      await expect(page.getByLabel("Highest spindle speed (rpm)").inputValue()).resolves.toBe("12000");
      await page.goBack();
      await attention.waitFor();

      // CSV export of the ranked list, as the browser downloads it.
      const [download] = await Promise.all([
        page.waitForEvent("download"),
        page.locator("#needs-attention-heading").locator("..").getByRole("link", { name: "Export CSV" }).click(),
      ]);
      const csv = readFileSync((await download.path())!, "utf8").split("\r\n");
      expect(csv[0]).toMatch(/^rank,sheet,title,machine_class,version,reports,failed,failure_share,wilson_lower_0.95,wilson_upper_0.95/);
      expect(csv.some((line) => line.includes(`,${flagged.slug},`))).toBe(true);

      // Drill into the flagged sheet: its versions, the linked ticket and the hand-off.
      await Promise.all([page.waitForURL(new RegExp(`/drafting/field/${flagged.slug}$`)), top.getByRole("link").first().click()]);
      await page.getByTestId("version-rollups").waitFor();
      await expect(page.getByTestId("version-rollups").textContent()).resolves.toContain(`v${flagged.number}`);
      await page.getByText("ap too deep for light machines").waitFor();
      const versionsCsv = await page.request.get((await page.getByRole("link", { name: "Export CSV" }).first().getAttribute("href")) ?? "");
      expect(versionsCsv.headers()["content-type"]).toContain("text/csv");
      // One row per version (the demo sheets carry their earlier versions too); the flagged one is the published one.
      const versionRows = (await versionsCsv.text()).split("\r\n");
      expect(versionRows.find((row) => row.startsWith(`${flagged.slug},${flagged.number},`))).toMatch(
        new RegExp(`^${flagged.slug},${flagged.number},published,`),
      );
      await screenshot(page, "field-results-flagged-sheet");

      // The sheet whose v2 fixed v1: the comparison says so and the charts draw.
      await page.goto(`/${VENDOR}/drafting/field/${melted.slug}`);
      await page.locator('[data-verdict="fewer_failures"]').waitFor();
      await page.locator("figure[aria-label='Outcome reports per version'] .recharts-bar-rectangle").first().waitFor({ timeout: 30_000 });
      await page
        .locator("figure[aria-label='Failed reports by symptom and version'] .recharts-bar-rectangle")
        .first()
        .waitFor({ timeout: 30_000 });
      await screenshot(page, "field-results-fixed-sheet");

      // The digest on request arrives in MailDev with the flagged sheet on top and a stop link.
      const since = Date.now() - 1000;
      await page.goto(`/${VENDOR}/drafting/field`);
      await page.getByRole("button", { name: "Send me this week’s digest" }).click();
      await page.getByRole("status").filter({ hasText: "on its way" }).waitFor();
      const mail = await waitForMail(ENGINEER, /^Field results for Northbeck/, { after: since, timeoutMs: 60_000 });
      // Among the top items, with its drill-in link (other journeys may have added a failing version above it).
      expect(mail.text).toMatch(new RegExp(`^\\d\\. ${escapeRegExp(flagged.title)} \\(`, "m"));
      expect(mail.text).toContain(`/drafting/field/${flagged.slug}`);
      expect(mail.text).toMatch(/Stop the weekly digest: http\S+\/field\/digest\/stop\?token=/);

      // The weekly digest can be turned off and on again from the page.
      await page.getByRole("button", { name: "Stop the weekly digest" }).click();
      await page.getByRole("button", { name: "Send me the weekly digest" }).waitFor();
      await page.getByRole("button", { name: "Send me the weekly digest" }).click();
      await page.getByRole("button", { name: "Stop the weekly digest" }).waitFor();
    },
  );
});
