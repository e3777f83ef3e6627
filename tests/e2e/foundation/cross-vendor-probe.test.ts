import { createHash, randomBytes } from "node:crypto";
import type { Knex } from "knex";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

import { mustExist } from "@/tests/support/must-exist";

import { fillPattern, listAppRoutes, paramKeysOf } from "../support/app-routes";
import { openBrowser, screenshot, type Session } from "../support/browser";
import { closeE2eDb, e2eDb } from "../support/db";
import { BASE_URL } from "../support/env";
import { signInWithPassword } from "../support/sign-in";

// A member of vendor A (northbeck's admin, no role at quillon) probes every vendor route of the app with
// vendor B's slug and B's real object ids: every answer must be a 404, never data and never a 403.
const TARGET = "quillon";
const PROBER = "admin@northbeck.test";

// Routes that are public by design, with the reason.
const PUBLIC_BY_DESIGN: Record<string, string> = {
  "/[vendor]/sign-up": "anyone may create a customer account with any vendor",
  "/[vendor]/join/[token]": "an invitation link works for whoever holds it (probed with a forged token below)",
  "/api/v1/vendors/[vendor]/logo": "a vendor's logo is public branding, shown on the platform root",
  "/api/v1/vendors/[vendor]/setups/alerts/stop": "the one-click stop link of change alerts works by its signed token, without sign-in",
  "/api/v1/vendors/[vendor]/field/digest/stop": "the one-click stop link of the weekly digest works by its signed token, without sign-in",
};

type ValueSource = (db: Knex, vendorId: string) => Promise<string | undefined>;
const firstId =
  (table: string, column = "id"): ValueSource =>
  async (db, vendorId) =>
    (await db(table).where({ vendor_id: vendorId }).first(column))?.[column];

// Where a real object of the target vendor comes from, by "parent/[param]". A new dynamic segment
// without a source here fails the probe, so its author must add one.
const VALUE_SOURCES: Record<string, ValueSource> = {
  "/[vendor]": async () => TARGET,
  "vendors/[vendor]": async () => TARGET,
  "join/[token]": async () => "forged-token-forged-token-forged-token",
  "library/[sheet]": firstId("sheets", "slug"),
  "sheets/[slug]": firstId("sheets", "slug"),
  "v/[n]": async () => "1",
  "versions/[n]": async () => "1",
  "cutters/[sku]": firstId("cutters", "sku"),
  "materials/[slug]": firstId("materials", "slug"),
  "machine-classes/[slug]": firstId("machine_classes", "slug"),
  "machines/[id]": firstId("machines"),
  "setups/[id]": firstId("setups"),
  "outcomes/[outcomeId]": firstId("outcomes"),
  "adapt/[versionId]": firstId("sheet_versions"),
  "tickets/[ticket]": firstId("tickets"),
  "attachments/[attachment]": firstId("ticket_attachments"),
  "field/[slug]": firstId("sheets", "slug"),
  "field/[list]": async () => "needs-attention",
  "webhooks/[webhook]": firstId("webhooks"),
  "families/[family]": firstId("families", "slug"),
  "batches/[batch]": async () => "1",
};

describe("cross-vendor probe", () => {
  let session: Session;
  let values: Record<string, string>;
  const routes = listAppRoutes().filter((r) => r.pattern.startsWith("/[vendor]") || r.pattern.startsWith("/api/v1/vendors/[vendor]"));

  beforeAll(async () => {
    const db = e2eDb();
    const vendor = mustExist(await db("vendors").where({ slug: TARGET }).first("id"), "vendor");
    values = {};
    for (const key of new Set(routes.flatMap((r) => paramKeysOf(r.pattern)))) {
      const source = VALUE_SOURCES[key];
      if (!source) throw new Error(`The probe has no value source for the route parameter ${key}: add one to VALUE_SOURCES.`);
      const found = await source(db, vendor.id);
      // Without a seeded object the route is still probed, with a well-formed id that exists nowhere.
      if (!found) console.warn(`cross-vendor probe: no ${TARGET} object for ${key} in the demo data; probing with a made-up id`);
      values[key] = found ?? "00000000-0000-4000-8000-000000000000";
    }
    session = await openBrowser();
    await signInWithPassword(session.page, PROBER, "/northbeck/library");
  });

  afterAll(async () => {
    await session?.close();
    await closeE2eDb();
  });

  it("enumerates the app's vendor routes", () => {
    expect(routes.filter((r) => r.kind === "page").length).toBeGreaterThanOrEqual(6);
  });

  it("the prober really is signed in and reaches its own vendor's admin pages", async () => {
    const response = await session.page.goto("/northbeck/admin/members");
    expect(response?.status()).toBe(200);
  });

  it("gets 404 on every page of the other vendor", async () => {
    const failures: string[] = [];
    for (const route of routes.filter((r) => r.kind === "page" && !(r.pattern in PUBLIC_BY_DESIGN))) {
      const url = fillPattern(route.pattern, values);
      const response = await session.context.request.get(url, { maxRedirects: 0, failOnStatusCode: false });
      if (response.status() !== 404) failures.push(`${url} → ${response.status()}`);
    }
    await session.page.goto(fillPattern("/[vendor]/drafting", values));
    await screenshot(session.page, "cross-vendor-probe-404");
    expect(failures).toEqual([]);
  });

  it("gets 404 from every API route of the other vendor, for every method", async () => {
    const failures: string[] = [];
    for (const route of routes.filter((r) => r.kind === "api" && !(r.pattern in PUBLIC_BY_DESIGN))) {
      const url = fillPattern(route.pattern, values);
      for (const method of route.methods) {
        // With the app's own Origin, as the site's pages send it (and a script can): the probe tests tenant
        // isolation, which the cross-site check in front of writes must not mask.
        const headers = method === "GET" ? undefined : { origin: new URL(BASE_URL).origin };
        const response = await session.context.request.fetch(url, {
          method,
          headers,
          data: method === "GET" ? undefined : {},
          failOnStatusCode: false,
        });
        if (response.status() !== 404) failures.push(`${method} ${url} → ${response.status()}`);
        const text = await response.text();
        if (/quillon/i.test(text.replace(url, ""))) failures.push(`${method} ${url} leaks data`);
      }
    }
    expect(failures).toEqual([]);
  });

  it("a token of a removed member gets 404 from every API route of its former vendor, also after rejoining", async () => {
    const db = e2eDb();
    const vendor = mustExist(await db("vendors").where({ slug: TARGET }).first("id"), "vendor");
    const secret = `sbk_${randomBytes(24).toString("base64url")}`;
    const [user] = await db("users")
      .insert({ email: `removed-${randomBytes(4).toString("hex")}@example.test`, name: "Removed probe", email_verified: db.fn.now() })
      .returning("id");
    const [member] = await db("members")
      .insert({ vendor_id: vendor.id, user_id: user.id, role: "admin", created_at: new Date(Date.now() - 60_000) })
      .returning("id");
    await db("api_tokens").insert({
      vendor_id: vendor.id,
      user_id: user.id,
      name: "probe",
      prefix: secret.slice(0, 12),
      token_hash: createHash("sha256").update(secret).digest("hex"),
    });
    const probe = async (label: string, expectOk: boolean) => {
      const failures: string[] = [];
      for (const route of routes.filter((r) => r.kind === "api" && !(r.pattern in PUBLIC_BY_DESIGN))) {
        const url = fillPattern(route.pattern, values);
        for (const method of expectOk ? ["GET"] : route.methods) {
          if (!route.methods.includes(method)) continue;
          const response = await session.context.request.fetch(url, {
            method,
            data: method === "GET" ? undefined : {},
            failOnStatusCode: false,
            headers: { authorization: `Bearer ${secret}` },
          });
          if (!expectOk && response.status() !== 404) failures.push(`${label}: ${method} ${url} → ${response.status()}`);
          if (expectOk && response.status() === 200) return [];
        }
      }
      return expectOk ? [`${label}: the token never worked, so the probe proves nothing`] : failures;
    };
    try {
      expect(await probe("while a member", true)).toEqual([]);
      await db("members").where({ id: member.id }).delete();
      expect(await probe("removed", false)).toEqual([]);
      await db("members").insert({ vendor_id: vendor.id, user_id: user.id, role: "admin" });
      expect(await probe("rejoined", false)).toEqual([]);
    } finally {
      await db("users").where({ id: user.id }).delete();
    }
  });

  it("cannot use a forged invitation link", async () => {
    await session.page.goto(fillPattern("/[vendor]/join/[token]", values));
    await expect(session.page.getByRole("heading", { name: "This invitation is not valid" }).isVisible()).resolves.toBe(true);
  });
});
