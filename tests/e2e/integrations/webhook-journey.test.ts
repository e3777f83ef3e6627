import { createHash, randomBytes } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";

import { mustExist } from "@/tests/support/must-exist";

import { receiverAccepts, startReceiver } from "../../support/webhook-receiver";
import { openBrowser, screenshot, type Session } from "../support/browser";
import { closeE2eDb, e2eDb } from "../support/db";
import { signInWithPassword } from "../support/sign-in";

const ADMIN = "admin@northbeck.test";

/** A personal access token for a demo person (setup only; the calls below go through the API). */
async function tokenFor(email: string): Promise<string> {
  const db = e2eDb();
  const vendor = mustExist(await db("vendors").where({ slug: "northbeck" }).first("id"), "vendor");
  const user = mustExist(await db("users").where({ email }).first("id"), "user");
  const secret = `sbk_${randomBytes(24).toString("base64url")}`;
  await db("api_tokens").insert({
    vendor_id: vendor.id,
    user_id: user.id,
    name: "webhook e2e",
    prefix: secret.slice(0, 12),
    token_hash: createHash("sha256").update(secret).digest("hex"),
  });
  return secret;
}

async function until<T>(what: string, probe: () => Promise<T | undefined> | T | undefined, timeoutMs = 60_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await probe();
    if (value !== undefined) return value;
    if (Date.now() > deadline) throw new Error(`Timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 500));
  }
}

describe("webhooks", () => {
  let session: Session | undefined;
  const receiver = startReceiver();
  afterAll(async () => {
    await session?.close();
    await (await receiver).close();
    await closeE2eDb();
  });

  it("an admin adds a webhook; publishing a sheet delivers a verified payload that shows in the delivery log; send again repeats it", async () => {
    const hook = await receiver;
    session = await openBrowser();
    const { page } = session;
    await signInWithPassword(page, ADMIN, "/northbeck/admin/integrations");
    await page.locator("#f-url").fill(hook.url);
    await page.locator("#f-description").fill("e2e receiver");
    await page.getByRole("button", { name: "Add webhook" }).click();
    const secret = await page.locator("[data-secret]").getAttribute("data-secret", { timeout: 15_000 });
    expect(secret).toMatch(/^sbwh_/);
    await screenshot(page, "integrations-webhook-added");

    // A new sheet from an existing sheet's source, through the API: author, second engineer approves and publishes.
    const db = e2eDb();
    const source = await db("sheet_versions as v")
      .join("vendors as d", "d.id", "v.vendor_id")
      .where({ "d.slug": "northbeck", "v.state": "published" })
      // Not a plastics sheet: the search and Library e2e tests count Northbeck's acrylic and HDPE sheets.
      .whereNot("v.title", "ilike", "%acrylic%")
      .whereNot("v.title", "ilike", "%HDPE%")
      .orderBy("v.title")
      .first<{ source: string }>("v.source");
    const slug = `webhook-e2e-${randomBytes(3).toString("hex")}`;
    const [author, reviewer] = [await tokenFor("eng1@northbeck.test"), await tokenFor("eng2@northbeck.test")];
    const api = async (token: string, method: "post" | "put", path: string, data?: unknown) => {
      const response = await page.request[method](`/api/v1/vendors/northbeck${path}`, {
        headers: { authorization: `Bearer ${token}` },
        data: data ?? {},
        failOnStatusCode: false,
      });
      expect(response.status(), `${method} ${path}: ${await response.text()}`).toBeLessThan(300);
    };
    await api(author, "post", "/sheets", { slug, source: source.source });
    await api(author, "post", `/sheets/${slug}/draft/submit`, { changeNote: "Published for the webhook journey." });
    await api(reviewer, "post", `/sheets/${slug}/draft/approve`);
    await api(reviewer, "post", `/sheets/${slug}/draft/publish`);

    const got = await until("the sheet.published delivery", () =>
      hook.received.find((r) => r.headers["swarfbook-event"] === "sheet.published" && r.body.includes(slug)),
    );
    expect(receiverAccepts(secret!, got)).toBe(true);
    const body = JSON.parse(got.body);
    expect(body).toMatchObject({ type: "sheet.published", vendor: "northbeck", data: { sheet: slug, version: 1, supersedes: null } });

    await page.getByRole("link", { name: hook.url }).click();
    await page.waitForURL(/\/northbeck\/admin\/integrations\/webhooks\//);
    const row = page.locator('tr[data-delivery-event="sheet.published"][data-delivery-state="delivered"]');
    await until("the delivery in the log", async () => ((await row.count()) > 0 ? true : (await page.reload(), undefined)), 30_000);
    await expect(row.first().locator("[data-status]").getAttribute("data-status")).resolves.toBe("200");
    await screenshot(page, "integrations-delivery-log");

    const before = hook.received.length;
    await row.first().getByRole("button", { name: "Send again" }).click();
    await until("the repeated delivery", () => (hook.received.length > before ? true : undefined), 30_000);
    const again = hook.received.at(-1)!;
    expect(JSON.parse(again.body).id).toBe(body.id);
    expect(receiverAccepts(secret!, again)).toBe(true);
  });

  it("another vendor's webhook page is not found", async () => {
    const db = e2eDb();
    const other = await db("webhooks as w")
      .join("vendors as v", "v.id", "w.vendor_id")
      .where("v.slug", "quillon")
      .first<{ id: string } | undefined>("w.id");
    const id = other?.id ?? "00000000-0000-4000-8000-000000000000";
    const response = await session!.page.goto(`/northbeck/admin/integrations/webhooks/${id}`);
    expect(response?.status()).toBe(404);
  });
});
