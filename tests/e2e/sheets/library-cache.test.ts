import { randomBytes } from "node:crypto";
import type { Page } from "playwright-core";
import { afterAll, describe, expect, it } from "vitest";

import { openBrowser, type Session } from "../support/browser";
import { closeE2eDb, e2eDb } from "../support/db";
import { BASE_URL } from "../support/env";
import { signInWithPassword } from "../support/sign-in";

// Library pages are served from Next's cache (components/library/cached-*), and anonymous sheet and version pages
// from the page store (lib/library/page-store-proxy.ts: rendered once with a placeholder nonce, then served with a
// fresh nonce per response). These journeys fill both first, then check that a publish or a withdrawal shows at
// once, that the customers-only setting still turns visitors away, that the reader's own machines still reach the
// adapt panel of a cached page, and that a stored answer is the page Next renders, under a nonce of its own.

const VENDOR = "northbeck";

/** An anonymous GET of a page of the app under test: status, redirect target and body. */
async function visit(path: string, headers: Record<string, string> = {}) {
  const res = await fetch(BASE_URL + path, { redirect: "manual", headers });
  return { status: res.status, location: res.headers.get("location") ?? "", headers: res.headers, html: await res.text() };
}

const nonceOf = (res: { headers: Headers }) => /'nonce-([^']+)'/.exec(res.headers.get("content-security-policy") ?? "")?.[1] ?? "";
const withoutNonce = (res: { headers: Headers; html: string }) => res.html.split(nonceOf(res)).join("NONCE");

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

  /** Two engineers of the vendor, signed in once for the journeys that publish. */
  let engineers: Promise<[Page, Page]> | null = null;
  const signInEngineers = () =>
    (engineers ??= (async () => {
      const [e1, e2] = [await openBrowser(), await openBrowser()];
      sessions.push(e1, e2);
      await signInWithPassword(e1.page, "eng1@northbeck.test", `/${VENDOR}/drafting`);
      await signInWithPassword(e2.page, "eng2@northbeck.test", `/${VENDOR}/drafting`);
      return [e1.page, e2.page];
    })());

  it("a published version shows at once on cached pages, and so does its withdrawal", { timeout: 300_000 }, async () => {
    const slug = `cache-probe-${randomBytes(3).toString("hex")}`;
    const { source } = await publishedSource(VENDOR);
    const [p1, p2] = await signInEngineers();
    const e1 = { page: p1 };
    const e2 = { page: p2 };
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

  it("answers with the page Next renders, each time with a nonce of its own in the HTML and the CSP header", async () => {
    const { slug } = await publishedSource(VENDOR);
    const path = `/${VENDOR}/library/${slug}`;
    const answers = [];
    for (let i = 0; i < 4; i++) answers.push(await visit(path));
    const nonces = answers.map((a) => nonceOf(a));
    expect(new Set(nonces).size).toBe(nonces.length);
    for (const [i, a] of answers.entries()) {
      expect(a.status).toBe(200);
      expect(a.html).toContain(`nonce="${nonces[i]}"`);
      expect(a.headers.get("cache-control")).toMatch(/no-store/);
      expect(a.headers.get("x-frame-options")).toBe("DENY");
      expect(a.headers.get("content-type")).toMatch(/^text\/html/);
    }
    // A request with a session cookie (here one that no longer verifies: an anonymous reader) is rendered by Next.
    const fresh = await visit(path, { cookie: "next-auth.session-token=expired" });
    expect(fresh.status).toBe(200);
    const stored = answers[answers.length - 1];
    expect(withoutNonce(stored)).toBe(withoutNonce(fresh));
    // The units cookie picks the stored page of its unit system.
    const imperial = await visit(path, { cookie: "sb-units=imperial" });
    expect(imperial.status).toBe(200);
    expect(withoutNonce(imperial)).not.toBe(withoutNonce(stored));
  });

  it("leaves requests with a query to Next, which renders them as before", async () => {
    const { slug } = await publishedSource(VENDOR);
    const path = `/${VENDOR}/library/${slug}`;
    const stored = await visit(path);
    const query = await visit(`${path}?utm=x`);
    expect(query.status).toBe(200);
    expect(query.html).toContain("data-sheet=");
    expect(nonceOf(query)).not.toBe(nonceOf(stored));
  });

  it("vendor text with nonce= strings in it cannot carry the response nonce into markup", { timeout: 300_000 }, async () => {
    const { source } = await publishedSource(VENDOR);
    const slug = `nonce-probe-${randomBytes(3).toString("hex")}`;
    const [p1, p2] = await signInEngineers();
    const sheets = `/api/v1/vendors/${VENDOR}/sheets`;
    const probe = 'Probe nonce="abc" and `<script nonce="abc">alert(1)</script>` and nonce=x';
    await api(p1, "POST", sheets, { slug, source: `${source}\n\n${probe}\n` });
    await api(p1, "POST", `${sheets}/${slug}/draft/submit`, { changeNote: "Nonce probe." });
    await api(p2, "POST", `${sheets}/${slug}/draft/approve`);
    await api(p1, "POST", `${sheets}/${slug}/draft/publish`);

    for (let i = 0; i < 3; i++) {
      const a = await visit(`/${VENDOR}/library/${slug}`);
      expect(a.status).toBe(200);
      expect(a.html).toContain("Probe nonce=");
      const nonce = nonceOf(a);
      // Every place the nonce stands is Next's own: the nonce attribute of a script or preload tag, or the nonce
      // of a preload in the page's RSC data (a string inside a script).
      let at = a.html.indexOf(nonce);
      let places = 0;
      while (at !== -1) {
        if (!a.html.slice(0, at).endsWith('\\"nonce\\":\\"')) {
          expect(a.html.slice(a.html.lastIndexOf("<", at), at)).toMatch(/^<(script|link)\b[^>]* nonce="$/);
        }
        places++;
        at = a.html.indexOf(nonce, at + nonce.length);
      }
      expect(places).toBeGreaterThan(0);
      expect(a.html).not.toContain('<script nonce="abc"');
    }
  });

  it("a stored page runs in the browser under its CSP (no script refused)", { timeout: 180_000 }, async () => {
    const { slug } = await publishedSource(VENDOR);
    const path = `/${VENDOR}/library/${slug}`;
    await visit(path);
    const reader = await openBrowser();
    sessions.push(reader);
    const refused: string[] = [];
    reader.page.on("console", (m) => {
      if (/Content Security Policy/i.test(m.text())) refused.push(m.text());
    });
    await reader.page.goto(path);
    await reader.page.locator("[data-adapt-panel]").first().waitFor({ timeout: 60_000 });
    expect(refused).toEqual([]);
  });
});
