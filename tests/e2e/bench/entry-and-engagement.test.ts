import { afterAll, describe, expect, it } from "vitest";

import { openBrowser, screenshot, type Session } from "../support/browser";

// Invented demo data (seeds/): Northbeck's Library is public, so a visitor who has never signed in adapts sheets.
const VENDOR = "northbeck";
const ACRYLIC_QUARTER = "cast-acrylic-nb-sf-6350-rigid-router"; // 1/4 in single-flute cutter in cast acrylic
const BALL_NOSE = "hardwood-oak-nb-bn-6-rigid-router"; // 6 mm two-flute ball nose in white oak

const number = (text: string | null) => Number.parseFloat((text ?? "").replace(/[\s\u00a0\u202f,]/g, ""));

describe("adapting demo sheets as a new visitor", () => {
  const sessions: Session[] = [];
  afterAll(async () => {
    for (const s of sessions) await s.close();
  });

  it(
    "1/4 in acrylic on a light router with straight plunges only: the plunge is held near 10–12 in/min with the reason and a ramp suggestion; a full-width cut lowers the feed",
    { timeout: 240_000 },
    async () => {
      const c = await openBrowser({ viewport: { width: 1024, height: 1366 } });
      sessions.push(c);
      c.page.setDefaultTimeout(30_000);
      c.page.setDefaultNavigationTimeout(120_000);
      await c.page.goto(`/${VENDOR}/library/${ACRYLIC_QUARTER}`);
      const panel = c.page.locator("[data-adapt-panel]");
      await panel.waitFor();
      await panel.getByRole("button", { name: "in, hp" }).click();
      // The light router preset: belt drives, trim-router spindle, Z thrust 150 N (about 34 lbf).
      await panel.getByLabel("Start from a kind of machine").selectOption("light-trim-router");
      await expect(panel.getByLabel(/Z thrust/).inputValue()).resolves.toBe("34");
      await panel.getByLabel("Straight plunge only").check();

      const advice = panel.locator("[data-entry-advice]");
      await advice.locator('[data-entry-warning="plunge-thrust-limited"]').waitFor();
      const plunge = await advice.getByTestId("entry-plunge-feed").textContent();
      expect(plunge).toMatch(/in\/min/);
      // Common practice: a 1/4 in cutter in cast acrylic plunges at no more than about 10–12 in/min on a light Z.
      expect(number(plunge)).toBeGreaterThanOrEqual(9.5);
      expect(number(plunge)).toBeLessThanOrEqual(12.5);
      expect(number(await panel.getByTestId("adapted-plunge").textContent())).toBeCloseTo(number(plunge), 1);
      // The reason, in the steps and in the box, and the ramp suggestion.
      await expect(panel.locator('[data-rule="plunge-feed"]').textContent()).resolves.toMatch(/Z axis/);
      await expect(advice.locator('[data-entry-warning="ramp-entry-recommended"]').count()).resolves.toBe(1);
      await expect(advice.textContent()).resolves.toMatch(/ramp or helix recommended/i);
      // Straight plunges in a material that melts: passes of at most D/4 (1/16 in), explained in the steps.
      await expect(panel.locator('[data-rule="entry-capability"]').textContent()).resolves.toMatch(/quarter of the cutter diameter/);
      expect(number(await panel.getByTestId("adapted-ap").textContent())).toBeLessThanOrEqual(0.0625 + 1e-4);
      await screenshot(c.page, "adapt-plunge-only-light-router");

      // The profile at full width (ae = D): the slotting factor lowers the feed.
      await panel.getByLabel("Operation").selectOption({ label: "Profile (contour)" });
      await expect.poll(() => panel.getByTestId("adapted-vf").textContent()).toMatch(/in\/min/);
      const profileFeed = number(await panel.getByTestId("adapted-vf").textContent());
      await panel.getByLabel("ae (radial depth)").fill("1/4");
      await expect.poll(async () => number(await panel.getByTestId("adapted-vf").textContent())).toBeLessThan(profileFeed * 0.85);
      await panel.locator('[data-warning="slotting-factor-applied"]').waitFor();
      await screenshot(c.page, "adapt-full-width-override");
    },
  );

  it("a ball-nose sheet shows vc at the effective diameter De, below vc at the full diameter", { timeout: 180_000 }, async () => {
    const c = await openBrowser({ viewport: { width: 1024, height: 1366 } });
    sessions.push(c);
    c.page.setDefaultTimeout(30_000);
    c.page.setDefaultNavigationTimeout(120_000);
    await c.page.goto(`/${VENDOR}/library/${BALL_NOSE}`);
    const panel = c.page.locator("[data-adapt-panel]");
    await panel.waitFor();
    await panel.getByLabel("Start from a kind of machine").selectOption("rigid-ball-screw");
    await expect(panel.getByRole("rowheader", { name: "vc (cutting speed at De)" }).count()).resolves.toBe(1);
    await expect.poll(() => panel.getByTestId("adapted-de").textContent()).toMatch(/mm/);
    const de = number(await panel.getByTestId("adapted-de").textContent());
    const n = number(await panel.getByTestId("adapted-n").textContent());
    const vc = number(await panel.getByTestId("adapted-vc").textContent());
    // vc = π·De·n/1000 (ISO 3002-1) with De = 2·√(ap·(D − ap)) < D = 6 mm for the shallow finishing pass.
    expect(de).toBeLessThan(6);
    expect(vc).toBeCloseTo((Math.PI * de * n) / 1000, -1);
    expect(vc).toBeLessThan(((Math.PI * 6 * n) / 1000) * 0.9);
    await screenshot(c.page, "adapt-ball-nose-effective-diameter");
  });
});
