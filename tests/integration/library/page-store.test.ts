import { NextRequest } from "next/server";
import { beforeEach, describe, expect, it } from "vitest";

import { db } from "@/lib/db/knex";
import { bumpLibraryGeneration, readLibraryGeneration } from "@/lib/library/library-generation";
import { findLibraryVendorState } from "@/lib/library/library-vendor-state";
import { pageStoreKey } from "@/lib/library/page-store";
import { storedBody } from "@/lib/library/page-store-body";
import { answerFromStore } from "@/lib/library/page-store-proxy";
import { pageStoreState } from "@/lib/library/page-store-state";
import { startNewVersion } from "@/lib/sheets/start-new-version";
import { withdrawVersion } from "@/lib/sheets/withdraw-version";
import { updateBranding } from "@/lib/vendors/update-branding";
import { createDraftingScenario, publishOpenDraft, sourceWithFeed } from "@/tests/factories/sheets";
import { mustExist } from "@/tests/support/must-exist";

// The proxy's answer from the page store, against the database: a stored page is served only while the vendor's
// Library generation is the one it was rendered under, so a change is never hidden once it has committed, on any
// app instance (the store is per process; the generation is read from the database on every request). PORT is
// unset, so nothing is rendered over loopback here: a page not served from the store answers null (Next renders).

const csp = (nonce: string) => `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'`;
const get = (path: string, cookie?: string) => new NextRequest(`http://127.0.0.1${path}`, { headers: cookie ? { cookie } : {} });

async function storePage(vendor: { id: string; slug: string }, path: string, text: string) {
  const state = mustExist(await findLibraryVendorState(vendor.slug), "the vendor");
  const { store, placeholderNonce } = pageStoreState();
  store.set(pageStoreKey(path, "metric"), {
    vendorId: vendor.id,
    generation: state.generation,
    versionId: null,
    body: storedBody(
      `<html><script nonce="${placeholderNonce}">1</script><p>${text}</p><script nonce="${placeholderNonce}">2</script></html>`,
      placeholderNonce,
    ),
    headers: [
      ["content-type", "text/html; charset=utf-8"],
      ["link", `</_next/static/a.css>; rel=preload; as="style"; nonce="${placeholderNonce}"`],
    ],
  });
}

async function answer(vendor: { slug: string }, path: string) {
  const response = await answerFromStore(get(path), vendor.slug, csp);
  return response ? { csp: response.headers.get("content-security-policy") ?? "", html: await response.text(), response } : null;
}

describe("Library page store against the database", () => {
  beforeEach(() => {
    delete process.env.PORT;
  });

  it("answers with a fresh nonce in the HTML and the CSP header, never the placeholder, never twice the same", async () => {
    const s = await createDraftingScenario();
    await publishOpenDraft(s);
    const path = `/${s.vendor.slug}/library/${s.slug}`;
    await storePage(s.vendor, path, "version one");
    const a = mustExist(await answer(s.vendor, path), "a stored answer");
    const b = mustExist(await answer(s.vendor, path), "a stored answer");
    for (const one of [a, b]) {
      const nonce = mustExist(/'nonce-([^']+)'/.exec(one.csp), "a nonce in the CSP header")[1];
      expect(one.html.split(`nonce="${nonce}"`).length - 1).toBe(2);
      expect(one.html).not.toContain(pageStoreState().placeholderNonce);
      expect(one.response.headers.get("cache-control")).toContain("no-store");
      expect(one.response.headers.get("x-content-type-options")).toBe("nosniff");
      expect(one.response.headers.get("content-type")).toBe("text/html; charset=utf-8");
      expect(one.response.headers.get("link")).toContain(`nonce="${nonce}"`);
      for (const [, value] of one.response.headers) expect(value).not.toContain(pageStoreState().placeholderNonce);
    }
    expect(a.csp).not.toBe(b.csp);
    // Another unit system is another page: not stored, so Next renders it.
    expect(await answerFromStore(get(path, "sb-units=imperial"), s.vendor.slug, csp)).toBeNull();
  });

  it("stops serving a version the moment its withdrawal commits, and not before", async () => {
    const s = await createDraftingScenario();
    await publishOpenDraft(s);
    const path = `/${s.vendor.slug}/library/${s.slug}`;
    await storePage(s.vendor, path, "version one, current");
    expect((await answer(s.vendor, path))?.html).toContain("version one, current");

    // Inside an open transaction the change is not visible to readers: the stored page is still right.
    await db.transaction(async (trx) => {
      await bumpLibraryGeneration(trx, s.vendor.id);
      expect((await answer(s.vendor, path))?.html).toContain("version one, current");
    });
    // Committed: the page rendered before it is never served again.
    expect(await answer(s.vendor, path)).toBeNull();

    await storePage(s.vendor, path, "version one, current");
    expect(await answer(s.vendor, path)).not.toBeNull();
    await withdrawVersion({ ...s.as(s.engineer.user.id), reason: "Chatter reported on light routers." });
    expect(await answer(s.vendor, path)).toBeNull();
    expect(pageStoreState().store.get(pageStoreKey(path, "metric"))).toBeUndefined();
  });

  it("stops serving a sheet's page when a new version is published", async () => {
    const s = await createDraftingScenario();
    await publishOpenDraft(s);
    const path = `/${s.vendor.slug}/library/${s.slug}/v/1`;
    await storePage(s.vendor, path, "version one, current");
    const before = await readLibraryGeneration(s.vendor.id);
    await startNewVersion({ ...s.as(s.engineer.user.id), source: sourceWithFeed("1620 mm/min") });
    await publishOpenDraft(s, "Second version.");
    expect(await readLibraryGeneration(s.vendor.id)).not.toBe(before);
    expect(await answer(s.vendor, path)).toBeNull();
  });

  it("never answers for a customers-only Library, even with a page stored; the setting's change ends stored pages", async () => {
    const closed = await createDraftingScenario({ libraryPublic: false });
    await publishOpenDraft(closed);
    const closedPath = `/${closed.vendor.slug}/library/${closed.slug}`;
    await storePage(closed.vendor, closedPath, "must not be served");
    expect(await answer(closed.vendor, closedPath)).toBeNull();

    const open = await createDraftingScenario();
    await publishOpenDraft(open);
    const path = `/${open.vendor.slug}/library/${open.slug}`;
    await storePage(open.vendor, path, "public for now");
    expect(await answer(open.vendor, path)).not.toBeNull();
    await updateBranding({
      vendorId: open.vendor.id,
      actorUserId: open.admin.user.id,
      input: {
        vendor: open.vendor.slug,
        name: open.vendor.name,
        accentColor: "#1d4ed8",
        libraryPublic: false,
        requireSecondApproval: false,
      },
    });
    expect(await answer(open.vendor, path)).toBeNull();
  });

  it("shares a vendor's state read among concurrent readers and still sees a change committed before a call", async () => {
    const s = await createDraftingScenario();
    const first = await Promise.all(Array.from({ length: 20 }, () => findLibraryVendorState(s.vendor.slug)));
    expect(new Set(first.map((v) => v?.generation)).size).toBe(1);
    const inFlight = findLibraryVendorState(s.vendor.slug);
    await db.transaction((trx) => bumpLibraryGeneration(trx, s.vendor.id));
    const after = await findLibraryVendorState(s.vendor.slug);
    await inFlight;
    expect(BigInt(mustExist(after, "the vendor").generation)).toBe(BigInt(mustExist(first[0], "the vendor").generation) + 1n);
  });

  it("leaves unknown vendors to Next", async () => {
    expect(await answerFromStore(get("/no-such-vendor-x/library/a"), "no-such-vendor-x", csp)).toBeNull();
  });
});
