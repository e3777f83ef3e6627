import { afterAll, describe, expect, it } from "vitest";

import { mustExist } from "@/tests/support/must-exist";

import { openBrowser, screenshot, type Session } from "../support/browser";
import { closeE2eDb, e2eDb } from "../support/db";
import { signInWithPassword } from "../support/sign-in";

const ENGINEER = "eng2@northbeck.test";
const VENDOR = "northbeck";

// A suggestion of the seeded demo data (seeds/seed-field.ts): a feed customers lowered on a published version of a
// sheet with no open draft.
async function demoSuggestion() {
  const db = e2eDb();
  const vendor = mustExist(await db("vendors").where({ slug: VENDOR }).first("id"), "vendor");
  const row = await db("field_change_rollups as c")
    .join("sheet_versions as v", "v.id", "c.sheet_version_id")
    .join("sheets as s", "s.id", "v.sheet_id")
    .where({ "c.vendor_id": vendor.id, "v.state": "published", "c.param": "feedMmMin" })
    .where("c.median_pct", "<", -1)
    .whereNotExists(db("sheet_versions as d").whereRaw("d.sheet_id = s.id").whereIn("d.state", ["draft", "in_review"]))
    .orderBy("c.reports", "desc")
    .first("s.id as sheet_id", "s.slug", "v.number", "v.front_matter", "c.operation_index", "c.median_pct");
  expect(row, "demo data: a feed customers lowered on a published version").toBeTruthy();
  const vf = row.front_matter.operations[row.operation_index].vf as { text: string; value: number };
  expect(vf.text, "demo sheets state feeds in mm/min").toMatch(/mm\/min$/);
  return { ...row, vf, expected: `${Math.round(vf.value * (1 + Number(row.median_pct) / 100))} mm/min` };
}

describe("The field loop, closed", () => {
  let session: Session;
  afterAll(async () => {
    await session?.close();
    await closeE2eDb();
  });

  it("an engineer starts a draft from what customers changed and sees the changed number in the editor", { timeout: 300_000 }, async () => {
    const suggestion = await demoSuggestion();
    session = await openBrowser({ viewport: { width: 1280, height: 1400 } });
    const { page } = session;
    page.setDefaultNavigationTimeout(90_000);
    await signInWithPassword(page, ENGINEER, `/${VENDOR}/drafting/field`);

    await page.goto(`/${VENDOR}/drafting/field/${suggestion.slug}`);
    const row = page
      .locator(`[data-testid="customer-changes"] li[data-param="feedMmMin"][data-operation="${suggestion.operation_index}"]`)
      .filter({ hasText: `Version ${suggestion.number}` });
    await row.waitFor();
    await screenshot(page, "field-loop-suggestion");
    await Promise.all([
      page.waitForURL(new RegExp(`/drafting/sheets/${suggestion.slug}/edit$`)),
      row.getByRole("button", { name: "Start a draft from this" }).click(),
    ]);

    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toMatch(
      new RegExp(`^Edit version ${suggestion.number + 1}:`),
    );
    const source = await page.getByLabel("Sheet source (YAML front matter and MDX)").inputValue();
    expect(source).toContain(`vf: ${suggestion.expected}`);
    const note = page.getByTestId("draft-change-note");
    await expect(note.textContent()).resolves.toContain(`${suggestion.vf.text} → ${suggestion.expected}`);
    await expect(note.textContent()).resolves.toMatch(/in \d+ “worked after changes” reports on version \d+/);
    await expect(note.textContent()).resolves.not.toMatch(/@example\.test/);
    await expect(page.getByLabel(/Change note/).inputValue()).resolves.toMatch(/^From Field results:/);
    await screenshot(page, "field-loop-draft");

    // Clicked again from the list: the same draft opens, no second one.
    await page.goto(`/${VENDOR}/drafting/field/${suggestion.slug}`);
    await Promise.all([
      page.waitForURL(new RegExp(`/drafting/sheets/${suggestion.slug}/edit$`)),
      page
        .locator(`[data-testid="customer-changes"] li[data-param="feedMmMin"][data-operation="${suggestion.operation_index}"]`)
        .filter({ hasText: `Version ${suggestion.number}` })
        .getByRole("button", { name: "Start a draft from this" })
        .click(),
    ]);
    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toMatch(
      new RegExp(`^Edit version ${suggestion.number + 1}:`),
    );
  });

  it(
    "the trends table shows the sheet's weeks over the chosen range, and a wrong date is answered in words",
    { timeout: 120_000 },
    async () => {
      const db = e2eDb();
      // The Northbeck sheet with the most reports, and the weeks they fall in.
      const weeks = await db("field_week_rollups as w")
        .join("sheets as s", "s.id", "w.sheet_id")
        .join("vendors as vd", "vd.id", "w.vendor_id")
        .where("vd.slug", VENDOR)
        .groupBy("s.slug")
        .orderBy([{ column: "reports", order: "desc" }, { column: "s.slug" }])
        .limit(1)
        .select(
          "s.slug",
          db.raw("to_char(min(w.week), 'YYYY-MM-DD') as first"),
          db.raw("to_char(max(w.week), 'YYYY-MM-DD') as last"),
          db.raw("sum(w.outcomes)::int as reports"),
        );
      const sheet = weeks[0] as { slug: string };
      const { first, last, reports } = weeks[0] as { first: string; last: string; reports: number };
      const { page } = session ?? (session = await openBrowser());
      await page.goto(`/${VENDOR}/drafting/field/${sheet.slug}?from=${first}&to=${last}`);
      const table = page.getByTestId("trend-table");
      await table.waitFor();
      const rows = await table
        .locator("tbody tr")
        .evaluateAll((trs) => trs.map((tr) => ({ week: tr.getAttribute("data-week"), reports: Number(tr.getAttribute("data-reports")) })));
      expect(rows[0].week).toBe(first);
      expect(rows[rows.length - 1].week).toBe(last);
      expect(rows.length).toBe(Math.round((Date.parse(last) - Date.parse(first)) / (7 * 86_400_000)) + 1);
      expect(rows.reduce((sum, r) => sum + r.reports, 0)).toBe(reports);
      await page.getByTestId("publication-verdict").waitFor();
      await page
        .locator("figure[aria-label='Outcome reports and failure share per week'] .recharts-bar-rectangle")
        .first()
        .waitFor({ timeout: 30_000 });
      await screenshot(page, "field-loop-trends");

      await page.goto(`/${VENDOR}/drafting/field/${sheet.slug}?from=last-tuesday`);
      await expect(page.getByRole("alert").filter({ hasText: "YYYY-MM-DD" }).textContent()).resolves.toContain("Showing the last 26 weeks");
      await page.goto(`/${VENDOR}/drafting/field?from=${first}&to=${last}&class=light-router`);
      await page.getByRole("form", { name: "Filter Needs attention" }).waitFor();
      await expect(page.getByLabel("Machine class").inputValue()).resolves.toBe("light-router");
      // The list and its CSV hold only that class's versions.
      await page.getByTestId("needs-attention").or(page.getByText("Nothing needs attention")).first().waitFor();
      const classes = await page.getByTestId("needs-attention").locator("tbody tr .text-xs").allTextContents();
      expect(classes.every((c) => c === "Light belt-drive router")).toBe(true);
      const href = await page
        .locator("#needs-attention-heading")
        .locator("..")
        .getByRole("link", { name: "Export CSV" })
        .getAttribute("href");
      expect(href).toContain("class=light-router");
      const lines = (await (await page.request.get(href ?? "")).text()).split("\r\n").filter(Boolean);
      expect(lines[0]).toMatch(/^rank,sheet,title,machine_class,/);
      expect(lines.slice(1).every((line) => line.includes(",Light belt-drive router,"))).toBe(true);
      expect(lines.length - 1).toBeGreaterThanOrEqual(classes.length);
    },
  );
});
