import { describe, expect, it } from "vitest";

import { PageStore, pageStoreKey, withNonce, type StoredPage } from "@/lib/library/page-store";
import { bodyWithNonce, storedBody } from "@/lib/library/page-store-body";

const PLACEHOLDER = "placeholder-nonce";
const page = (html: string, vendorId = "v1", generation = "3"): StoredPage => ({
  vendorId,
  generation,
  versionId: "x",
  body: storedBody(html, PLACEHOLDER),
  headers: [],
});
const text = (stored: StoredPage | undefined) => stored && Buffer.from(bodyWithNonce(stored.body, PLACEHOLDER)).toString();
const size = (key: string, html: string) => storedBody(html, PLACEHOLDER).bytes + key.length;

describe("Library page store", () => {
  it("keys pages by path and unit system", () => {
    const store = new PageStore(10_000);
    store.set(pageStoreKey("/acme/library/a", "metric"), page("metric page"));
    store.set(pageStoreKey("/acme/library/a", "imperial"), page("imperial page"));
    expect(text(store.get(pageStoreKey("/acme/library/a", "metric")))).toBe("metric page");
    expect(text(store.get(pageStoreKey("/acme/library/a", "imperial")))).toBe("imperial page");
    expect(store.get(pageStoreKey("/acme/library/b", "metric"))).toBeUndefined();
    expect(pageStoreKey("/acme/library/a", "metric")).not.toBe(pageStoreKey("/acme/library/a", "imperial"));
  });

  it("stays within its bytes and drops the least recently used page first", () => {
    const html = "x".repeat(100);
    const store = new PageStore(size("a", html) * 2 + 10);
    store.set("a", page(html));
    store.set("b", page(html));
    expect(store.get("a")).toBeDefined(); // a is now more recent than b
    store.set("c", page(html));
    expect(store.get("b")).toBeUndefined();
    expect(store.get("a")).toBeDefined();
    expect(store.get("c")).toBeDefined();
    expect(store.bytes).toBe(size("a", html) * 2);
  });

  it("counts multi-byte text by its bytes and never keeps a page larger than the whole store", () => {
    const store = new PageStore(50);
    store.set("a", page("ø".repeat(30))); // 60 bytes
    expect(store.size).toBe(0);
    expect(store.bytes).toBe(0);
  });

  it("replaces a page under the same key without counting it twice", () => {
    const store = new PageStore(1_000);
    store.set("a", page("one"));
    store.set("a", page("three"));
    expect(store.size).toBe(1);
    expect(store.bytes).toBe(size("a", "three"));
  });

  it("drops the pages of one vendor rendered under an older generation, and only those", () => {
    const store = new PageStore(1_000);
    store.set("a", page("a", "v1", "3"));
    store.set("b", page("b", "v2", "3"));
    store.set("c", page("c", "v1", "3"));
    store.set("d", page("d", "v1", "4"));
    store.dropStale("v1", "4");
    expect([store.get("a"), text(store.get("b")), store.get("c"), text(store.get("d"))]).toEqual([undefined, "b", undefined, "d"]);
    expect(store.bytes).toBe(size("b", "b") + size("d", "d"));
  });

  it("puts the response's nonce wherever the placeholder stood in a header, and nowhere else", () => {
    const placeholder = "Zq3_placeholder_9f";
    const link = `</a.js>; rel=preload; as="script"; nonce="${placeholder}", </b.css>; rel=preload; nonce="${placeholder}"`;
    const out = withNonce(link, placeholder, "N0NCE==");
    expect(out).toBe(`</a.js>; rel=preload; as="script"; nonce="N0NCE==", </b.css>; rel=preload; nonce="N0NCE=="`);
    expect(out).not.toContain(placeholder);
  });
});
