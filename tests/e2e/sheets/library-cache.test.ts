import { randomBytes } from "node:crypto";
import type { Page } from "playwright-core";
import { afterAll, describe, expect, it } from "vitest";

import { openBrowser, type Session } from "../support/browser";
import { closeE2eDb, e2eDb } from "../support/db";
import { BASE_URL } from "../support/env";
import { signInWithPassword } from "../support/sign-in";

// Library pages are served from Next's cache (components/library/cached-*). These journeys fill the cache first,
// then check that a publish or a withdrawal shows at once, that the customers-only setting still turns visitors
// away, and that the reader's own machines still reach the adapt panel of a cached page.

const VENDOR = "northbeck";

/** An anonymous GET of a page of the app under test: status, redirect target and body. */
async function visit(path: string) {
  const res = await fetch(BASE_URL + path, { redirect: "manual" });
  return { status: res.status, location: res.headers.get("location") ?? "", html: await res.text() };
}

async function api(page: Page, method: "PUT" | "POST" | "DELETE", url: string, data?: unknown) {
  // A change made with the session cookie must name the app's origin, as the browser does for its own fetches.
  const res = await page.request.fetch(url, {
    method,
    data,
    headers: { "content-type": "application/json", origin: new URL(BASE_URL).origin },
  });
  expect(res.status(), `${method} ${url}: ${await res.text()}`).toBeLessThan(300);
  return res.status() === 204 ? null : res.json();
}

async function publishedSource(vendor: string) {
  const row = await e2eDb()("sheet_versions as v")
    .join("vendors as d", "d.id", "v.vendor_id")
    .join("sheets as s", "s.id", "v.sheet_id")
    .where({ "d.slug": vendor, "v.state": "published" })
    .orderBy("s.slug", "desc")
    .first<{ source: string; slug: string }>("v.source", "s.slug");
  expect(row, `demo data: a published ${vendor} sheet`).toBeTruthy();
  return row!;
}

describe("Library pages from the cache", () => {
  const sessions: Session[] = [];
  afterAll(async () => {
    for (const s of sessions) await s.close();
    await closeE2eDb();
  });

  it("a published version shows at once on cached pages, and so does its withdrawal", { timeout: 300_000 }, async () => {
    const slug = `cache-probe-${randomBytes(3).toString("hex")}`;
    const { source } = await publishedSource(VENDOR);
    const e1 = await openBrowser();
    const e2 = await openBrowser();
    sessions.push(e1, e2);
    await signInWithPassword(e1.page, "eng1@northbeck.test", `/${VENDOR}/drafting`);
    await signInWithPassword(e2.page, "eng2@northbeck.test", `/${VENDOR}/drafting`);
    const sheets = `/api/v1/vendors/${VENDOR}/sheets`;
    const draft = `${sheets}/${slug}/draft`;
    const publish = async (note: string) => {
      await api(e1.page, "POST", `${draft}/submit`, { changeNote: note });
      await api(e2.page, "POST", `${draft}/approve`);
      await api(e1.page, "POST", `${draft}/publish`);
    };

    // The index is cached (read twice) before the sheet exists; publishing puts the sheet on it.
    for (let i = 0; i < 2; i++) expect((await visit(`/${VENDOR}/library`)).html).not.toContain(slug);
    await api(e1.page, "POST", sheets, { slug, source });
    await publish("First version (cache probe).");
    expect((await visit(`/${VENDOR}/library`)).html).toContain(`/${VENDOR}/library/${slug}`);

    // Version 1 read twice (now from the cache); a second version replaces it on the sheet's page at once.
    for (let i = 0; i < 2; i++) expect((await visit(`/${VENDOR}/library/${slug}`)).html).toContain('data-version="1"');
    for (let i = 0; i < 2; i++) expect((await visit(`/${VENDOR}/library/${slug}/v/1`)).html).not.toContain("Superseded on");
    await api(e1.page, "PUT", draft, { source: `${source}\n\nSecond version of the cache probe.\n` });
    await publish("Second version (cache probe).");
    expect((await visit(`/${VENDOR}/library/${slug}`)).html).toContain('data-version="2"');
    expect((await visit(`/${VENDOR}/library/${slug}/v/1`)).html).toContain("Superseded on");

    // Withdrawn: the cached version page and the sheet's page show the reason at once.
    for (let i = 0; i < 2; i++) expect((await visit(`/${VENDOR}/library/${slug}/v/2`)).html).not.toContain("Withdrawn on");
    const reason = `Cache probe withdrawal ${randomBytes(3).toString("hex")}`;
    await api(e1.page, "POST", `${sheets}/${slug}/withdraw`, { reason });
    const withdrawn = await visit(`/${VENDOR}/library/${slug}/v/2`);
    expect(withdrawn.html).toContain("Withdrawn on");
    expect(withdrawn.html).toContain(reason);
  });

  it(
    "a customers-only Library turns an anonymous visitor away from pages a customer has just read (cached)",
    { timeout: 180_000 },
    async () => {
      const { slug } = await publishedSource("quillon");
      const cutter = await e2eDb()("cutters as c")
        .join("vendors as d", "d.id", "c.vendor_id")
        .where({ "d.slug": "quillon" })
        .orderBy("c.sku")
        .first<{ sku: string }>("c.sku");
      const paths = [
        "/quillon/library",
        `/quillon/library/${slug}`,
        `/quillon/library/${slug}/v/1`,
        `/quillon/library/cutters/${encodeURIComponent(cutter!.sku)}`,
      ];
      const customer = await openBrowser();
      sessions.push(customer);
      await signInWithPassword(customer.page, "signs@example.test", "/quillon/library");
      for (const path of paths) {
        const res = await customer.page.request.get(path);
        expect(res.status(), path).toBe(200);
      }
      for (const path of paths) {
        const res = await visit(path);
        expect(res.status, path).toBeGreaterThanOrEqual(300);
        expect(res.status, path).toBeLessThan(400);
        expect(res.location, path).toContain("/sign-in?callbackUrl=");
        expect(res.html, path).not.toContain("data-sheet=");
      }
    },
  );

  it("a signed-in customer finds their own machines in the adapt panel of a cached sheet page", { timeout: 180_000 }, async () => {
    const { slug } = await publishedSource(VENDOR);
    // An anonymous reader first, so the sheet is rendered into the cache without anyone's machines.
    for (let i = 0; i < 2; i++) expect((await visit(`/${VENDOR}/library/${slug}`)).status).toBe(200);
    const c = await openBrowser();
    sessions.push(c);
    await signInWithPassword(c.page, "maker@example.test", `/${VENDOR}/bench`);
    const name = `Cache probe router ${randomBytes(3).toString("hex")}`;
    const { machine } = (await api(c.page, "POST", `/api/v1/vendors/${VENDOR}/machines`, {
      name,
      rpmMin: 8000,
      rpmMax: 24000,
      powerKw: 1.5,
      maxFeedMmMin: "5000 mm/min",
      rigidity: "moderate",
      spindleKind: "constant-torque",
      units: "metric",
    })) as { machine: { id: string } };
    try {
      await c.page.goto(`/${VENDOR}/library/${slug}`);
      const panel = c.page.locator("[data-adapt-panel]");
      await panel.waitFor({ timeout: 60_000 });
      const options = await panel.getByLabel("Adapt to").locator("option").allTextContents();
      expect(options.some((o) => o.includes(name))).toBe(true);
      // Another reader of the same cached page does not see this customer's machine.
      expect((await visit(`/${VENDOR}/library/${slug}`)).html).not.toContain(name);
    } finally {
      await api(c.page, "DELETE", `/api/v1/vendors/${VENDOR}/machines/${machine.id}`);
    }
  });
});
