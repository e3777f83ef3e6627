import { execFileSync } from "node:child_process";
import { randomBytes } from "node:crypto";
import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import type { Page } from "playwright-core";
import { afterAll, describe, expect, it } from "vitest";

import { openBrowser, screenshot, type Session } from "../support/browser";
import { closeE2eDb, e2eDb } from "../support/db";
import { BASE_URL } from "../support/env";
import { waitForMail } from "../support/maildev";
import { signInWithPassword } from "../support/sign-in";

const CUSTOMER = "maker@example.test";
const VENDOR = "northbeck";

// A published sheet with no open draft whose first operation runs faster than the weak machine can turn.
async function pickSheet() {
  const db = e2eDb();
  const rows = await db("sheet_versions as v")
    .join("sheets as s", "s.id", "v.sheet_id")
    .join("vendors as d", "d.id", "v.vendor_id")
    .where({ "d.slug": VENDOR, "v.state": "published" })
    .whereNotExists(db("sheet_versions as o").whereRaw("o.sheet_id = v.sheet_id").whereIn("o.state", ["draft", "in_review"]))
    .whereRaw("(v.front_matter->'operations'->0->'n'->>'value')::float > 14000")
    .orderBy("s.slug")
    .select("s.slug", "v.number", "v.source", "v.front_matter");
  expect(rows.length, "demo data: a published northbeck sheet above 14 000 rpm without a draft").toBeGreaterThan(0);
  return rows[0] as {
    slug: string;
    number: number;
    source: string;
    front_matter: { operations: { vf: { text: string; value: number } }[] };
  };
}

async function api(page: Page, method: "PUT" | "POST", url: string, data?: unknown) {
  // A change made with the session cookie must name the app's origin, as the browser does for its own fetches.
  const res = await page.request.fetch(url, {
    method,
    data,
    headers: { "content-type": "application/json", origin: new URL(BASE_URL).origin },
  });
  expect(res.status(), `${method} ${url}: ${await res.text()}`).toBeLessThan(300);
  return res.json();
}

describe("bench journey", () => {
  const sessions: Session[] = [];
  afterAll(async () => {
    for (const s of sessions) await s.close();
    await closeE2eDb();
  });

  it(
    "adapt a sheet to a weak machine → save → PDF → outcome; a new version → change alert with the diff",
    { timeout: 480_000 },
    async () => {
      const sheet = await pickSheet();
      const machineName = `Weak test router ${randomBytes(3).toString("hex")}`;
      const c = await openBrowser({ viewport: { width: 1024, height: 1366 } });
      sessions.push(c);
      c.page.setDefaultNavigationTimeout(90_000);
      await signInWithPassword(c.page, CUSTOMER, `/${VENDOR}/bench`);

      // Register a weak machine: 12 000 rpm top speed, 0.5 kW.
      await c.page.goto(`/${VENDOR}/bench/machines/new`);
      await c.page.getByLabel("Name").fill(machineName);
      await c.page.getByLabel("Lowest spindle speed (rpm)").fill("8000");
      await c.page.getByLabel("Highest spindle speed (rpm)").fill("12000");
      await c.page.getByLabel("Spindle power (kW)").fill("0.5");
      await c.page.getByLabel("Highest feed").fill("2500 mm/min");
      await c.page.getByLabel("How stiff is it?").selectOption("light");
      await c.page.getByLabel("Usual stick-out").fill("18 mm");
      await Promise.all([
        c.page.waitForURL(new RegExp(`/${VENDOR}/bench$`), { timeout: 60_000 }),
        c.page.getByRole("button", { name: "Register machine" }).click(),
      ]);
      await c.page.locator(`[data-machine="${machineName}"]`).waitFor({ timeout: 15_000 });

      // Open the sheet and adapt it to that machine: n is clamped, vf follows, the steps say why.
      await c.page.goto(`/${VENDOR}/library/${sheet.slug}`);
      const panel = c.page.locator("[data-adapt-panel]");
      await panel.waitFor({ timeout: 30_000 });
      await panel.getByLabel("Adapt to").selectOption({ label: machineName });
      await expect.poll(() => panel.getByTestId("adapted-n").textContent(), { timeout: 15_000 }).toMatch(/12\D?000\s*rpm/);
      await expect(panel.locator('[data-rule="spindle-speed-range"]').count()).resolves.toBeGreaterThan(0);
      await expect(panel.locator('[data-rule="feed-limit"]').count()).resolves.toBeGreaterThan(0);
      await screenshot(c.page, "bench-adapted-on-sheet");
      await panel.getByRole("button", { name: "Save as a setup" }).click();
      const open = panel.getByRole("link", { name: "Open the setup" });
      await open.waitFor({ timeout: 30_000 });
      await Promise.all([c.page.waitForURL(/\/bench\/setups\//, { timeout: 60_000 }), open.click()]);
      await screenshot(c.page, "bench-setup");

      // The PDF reads back with the clamped speed and the steps.
      const [download] = await Promise.all([
        c.page.waitForEvent("download", { timeout: 60_000 }),
        c.page.getByRole("link", { name: "Setup sheet (PDF)" }).click(),
      ]);
      const dir = mkdtempSync(path.join(tmpdir(), "bench-pdf-"));
      try {
        const file = path.join(dir, "setup.pdf");
        await download.saveAs(file);
        expect(readFileSync(file).subarray(0, 5).toString()).toBe("%PDF-");
        const text = execFileSync("pdftotext", ["-layout", file, "-"]).toString();
        expect(text).toContain(machineName);
        expect(text).toMatch(/12\D?000 rpm/);
        expect(text).toContain("Spindle speed range");
        expect(text).toContain("Starting points only");
      } finally {
        rmSync(dir, { recursive: true, force: true });
      }

      // Report an outcome; it shows in the history.
      await c.page.getByLabel("Failed").check();
      await c.page.getByLabel("What went wrong?").selectOption("chatter");
      await c.page.getByLabel("Notes (optional)").fill("Sang in the corners.");
      await c.page.getByRole("button", { name: "Report outcome" }).click();
      await c.page.locator('[data-outcome="failed"]').first().waitFor({ timeout: 30_000 });
      await screenshot(c.page, "bench-outcome");

      // An engineer starts a new version with a lower slot feed, a second engineer approves, the first publishes.
      const started = Date.now();
      const oldVf = sheet.front_matter.operations[0].vf;
      const newVf = `${Math.round(oldVf.value * 0.8)} mm/min`;
      const source = sheet.source.replace(new RegExp(`(vf:\\s*["']?)${oldVf.text.replace(/[/.]/g, "\\$&")}`), `$1${newVf}`);
      expect(source).not.toBe(sheet.source);
      const e1 = await openBrowser();
      const e2 = await openBrowser();
      sessions.push(e1, e2);
      await signInWithPassword(e1.page, "eng1@northbeck.test", `/${VENDOR}/drafting`);
      await signInWithPassword(e2.page, "eng2@northbeck.test", `/${VENDOR}/drafting`);
      const base = `/api/v1/vendors/${VENDOR}/sheets/${sheet.slug}/draft`;
      await api(e1.page, "PUT", base, { source });
      await api(e1.page, "POST", `${base}/submit`, { changeNote: "Slot feed lowered for light routers (e2e)." });
      await api(e2.page, "POST", `${base}/approve`);
      await api(e1.page, "POST", `${base}/publish`);

      const mail = await waitForMail(CUSTOMER, new RegExp(`version ${sheet.number + 1} replaces version ${sheet.number}`), {
        timeoutMs: 120_000,
        after: started - 1000,
      });
      expect(mail.text).toContain(machineName);
      expect(mail.text).toMatch(/vf \(feed rate\): .+ → .+/);
      expect(mail.text).toMatch(/Stop these e-mails: http\S+setups\/alerts\/stop\?token=/);

      // Leave the demo customer's Bench as it was (the machine's setups and outcomes go with it).
      await e2eDb()("machines").where({ name: machineName }).delete();
    },
  );
});
