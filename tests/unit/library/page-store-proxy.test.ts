import { NextRequest } from "next/server";
import { afterEach, describe, expect, it } from "vitest";

import { acceptStoreRender, storableVendorSlug, stripStoreHeaders, unitsOf } from "@/lib/library/page-store-proxy";
import { pageStoreState } from "@/lib/library/page-store-state";

const get = (path: string, headers: Record<string, string> = {}, method = "GET") =>
  new NextRequest(`http://127.0.0.1${path}`, { headers, method });

describe("which requests the Library page store answers", () => {
  afterEach(() => {
    delete process.env.LIBRARY_PAGE_STORE;
  });

  it("takes anonymous GETs of the index, cutter, sheet and version pages, naming the vendor", () => {
    expect(storableVendorSlug(get("/acme/library"))).toBe("acme");
    expect(storableVendorSlug(get("/acme/library/cutters/SF-125-O"))).toBe("acme");
    expect(storableVendorSlug(get("/acme/library/slot-6mm"))).toBe("acme");
    expect(storableVendorSlug(get("/acme/library/slot-6mm/v/3"))).toBe("acme");
    expect(storableVendorSlug(get("/acme/library/slot-6mm", { cookie: "sb-units=imperial; other=1" }))).toBe("acme");
    expect(storableVendorSlug(get("/acme/library/slot-6mm", { "sec-fetch-mode": "navigate", "sec-fetch-dest": "document" }))).toBe("acme");
  });

  it("never answers the browser router's fetches, whose RSC headers and _rsc query Next hides from the proxy", () => {
    // What a router.refresh() or a segment prefetch looks like from inside the proxy.
    const routerFetch = { "sec-fetch-mode": "cors", "sec-fetch-dest": "empty", accept: "*/*" };
    expect(storableVendorSlug(get("/acme/library/slot-6mm", routerFetch))).toBeNull();
    expect(storableVendorSlug(get("/acme/library/slot-6mm", { "sec-fetch-dest": "empty", "sec-fetch-mode": "same-origin" }))).toBeNull();
    // Node's fetch says "cors" but names no destination: a client such as a benchmark or a test, not the router.
    expect(storableVendorSlug(get("/acme/library/slot-6mm", { "sec-fetch-mode": "cors", accept: "*/*" }))).toBe("acme");
    expect(storableVendorSlug(get("/acme/library/slot-6mm", { "next-url": "/acme/library" }))).toBeNull();
  });

  it("leaves every other page, queries, RSC navigations, prefetches, other methods and sessions to Next", () => {
    const no = [
      get("/acme/library/"),
      get("/acme/library?cutter=SF-1"),
      get("/acme/library/search"),
      get("/acme/library/cutters"),
      get("/acme/library/cutters/SF-1/pdf"),
      get("/acme/library/cutters/SF-1/image"),
      get("/acme/library/slot-6mm/v/2/pdf"),
      get("/acme/library/slot-6mm/v/x"),
      get("/acme/library/slot-6mm/pdf"),
      get("/acme/desk"),
      get("/acme/library/slot-6mm?units=imperial"),
      get("/acme/library/slot-6mm", { rsc: "1" }),
      get("/acme/library/slot-6mm", { "next-router-prefetch": "1" }),
      get("/acme/library/slot-6mm", { purpose: "prefetch" }),
      get("/acme/library/slot-6mm", { "sec-purpose": "prefetch;prerender" }),
      get("/acme/library/slot-6mm", { cookie: "next-auth.session-token=abc" }),
      get("/acme/library/slot-6mm", { cookie: "__Secure-next-auth.session-token.0=abc" }),
      get("/acme/library/slot-6mm", {}, "HEAD"),
      get("/acme/library/slot-6mm", {}, "POST"),
    ];
    for (const request of no) expect(storableVendorSlug(request), `${request.method} ${request.nextUrl.href}`).toBeNull();
  });

  it("can be turned off (LIBRARY_PAGE_STORE=off)", () => {
    process.env.LIBRARY_PAGE_STORE = "off";
    expect(storableVendorSlug(get("/acme/library/slot-6mm"))).toBeNull();
  });

  it("keys the unit system by the sb-units cookie, metric unless it says imperial", () => {
    expect(unitsOf(get("/a/library/b"))).toBe("metric");
    expect(unitsOf(get("/a/library/b", { cookie: "sb-units=imperial" }))).toBe("imperial");
    expect(unitsOf(get("/a/library/b", { cookie: "sb-units=furlongs" }))).toBe("metric");
  });
});

describe("the proxy's own rendering request", () => {
  it("is recognised only with this process's secret and a token the proxy is waiting for", () => {
    const { renderSecret, pending } = pageStoreState();
    pending.set("t1", null);
    try {
      expect(acceptStoreRender(get("/a/library/b", { "x-swarfbook-page-render": `${renderSecret}.t1` }))).toBe("t1");
      expect(acceptStoreRender(get("/a/library/b", { "x-swarfbook-page-render": `${renderSecret}.t2` }))).toBeNull();
      expect(acceptStoreRender(get("/a/library/b", { "x-swarfbook-page-render": `guess.t1` }))).toBeNull();
      expect(acceptStoreRender(get("/a/library/b", { "x-swarfbook-page-render": "t1" }))).toBeNull();
      expect(acceptStoreRender(get("/a/library/b"))).toBeNull();
    } finally {
      pending.delete("t1");
    }
  });

  it("draws the placeholder nonce and the secret at random, per process", () => {
    const { placeholderNonce, renderSecret } = pageStoreState();
    expect(placeholderNonce).toMatch(/^[A-Za-z0-9_-]{32}$/);
    expect(renderSecret).toMatch(/^[A-Za-z0-9_-]{43}$/);
  });

  it("strips the store's headers a client sent", () => {
    const headers = new Headers({ "x-swarfbook-page-render": "x.y", "x-swarfbook-store-token": "y", accept: "text/html" });
    stripStoreHeaders(headers);
    expect([...headers.keys()]).toEqual(["accept"]);
  });
});
