// The proxy's side of the Library page store. An anonymous GET of a sheet page or a version page (no query, no
// session cookie, not an RSC navigation or prefetch) of a vendor whose Library is public is answered from the
// store; on a miss the proxy has the page rendered once over loopback, under the placeholder nonce and without
// the reader's cookies (only `sb-units`), stores it and answers with it. Every answer gets a fresh nonce, in the
// HTML and in its CSP header. A page is served only while the vendor's Library generation is the one it was
// rendered under, read from the database on every request, so a change is visible on every instance as soon as
// it commits.
import { randomUUID, timingSafeEqual } from "node:crypto";
import { NextResponse, type NextRequest } from "next/server";

import { SECURITY_HEADERS } from "@/lib/http/security-headers";
import type { UnitSystem } from "@/lib/machining/quantities";
import { UNITS_COOKIE, unitsFromCookie } from "@/lib/ui/units-cookie";

import { findLibraryVendorState, type LibraryVendorState } from "./library-vendor-state";
import { pageStoreKey, withNonce, type StoredPage } from "./page-store";
import { bodyWithNonce, storedBody } from "./page-store-body";
import { pageStoreState } from "./page-store-state";

/** Header of the proxy's own loopback request for a page to store: `<render secret>.<token>`. */
const RENDER_HEADER = "x-swarfbook-page-render";
/** Header the proxy hands the page being rendered for the store (never taken from a client). */
export const STORE_TOKEN_HEADER = "x-swarfbook-store-token";

// /<vendor>/library, /<vendor>/library/cutters/<sku>, /<vendor>/library/<sheet> and /<vendor>/library/<sheet>/v/<n>
// ("search" and "cutters" are not sheets).
const PAGE_PATH = /^\/([a-z0-9-]{1,64})\/library(?:\/cutters\/[^/]{1,200}|\/(?!search$|cutters$)[^/]{1,200}(?:\/v\/\d{1,6})?)?$/;
const KEPT_HEADERS = new Set(["content-type", "vary", "link"]);
const NO_SHARED_CACHE = "private, no-cache, no-store, max-age=0, must-revalidate";
const RENDER_TIMEOUT_MS = 15_000;

export const freshNonce = () => btoa(randomUUID());

function isSessionCookie(name: string) {
  return name.includes("session-token");
}

/** The vendor slug of a request the store may answer, or null. */
export function storableVendorSlug(request: NextRequest): string | null {
  if (process.env.LIBRARY_PAGE_STORE === "off") return null;
  if (request.method !== "GET" || request.nextUrl.search !== "") return null;
  const h = request.headers;
  // Next hides its own router headers (RSC, state tree, prefetch) and the `_rsc` query from the proxy, so a
  // router fetch looks like a plain GET here. A browser names what each request is for: only a document
  // (or a client that is no browser and says nothing) may get a stored page, never the router's fetches.
  const dest = h.get("sec-fetch-dest");
  if (dest !== null && dest !== "document") return null;
  if (h.has("next-url")) return null;
  if (h.has("rsc") || h.has("next-router-prefetch") || h.has("next-router-state-tree") || h.has("next-router-segment-prefetch"))
    return null;
  if (h.has("x-middleware-prefetch") || /prefetch/i.test(`${h.get("purpose") ?? ""} ${h.get("sec-purpose") ?? ""}`)) return null;
  if (request.cookies.getAll().some((c) => isSessionCookie(c.name))) return null;
  const match = PAGE_PATH.exec(request.nextUrl.pathname);
  return match ? match[1] : null;
}

export const unitsOf = (request: NextRequest): UnitSystem => unitsFromCookie(request.cookies.get(UNITS_COOKIE)?.value);

/**
 * The token of the proxy's own rendering request, or null for any other request (a client cannot know the
 * secret: it is drawn at start and only sent over loopback).
 */
export function acceptStoreRender(request: NextRequest): string | null {
  const value = request.headers.get(RENDER_HEADER);
  if (!value) return null;
  const { renderSecret, pending } = pageStoreState();
  const dot = value.lastIndexOf(".");
  const secret = Buffer.from(value.slice(0, dot));
  const expected = Buffer.from(renderSecret);
  const token = value.slice(dot + 1);
  if (dot < 0 || secret.length !== expected.length || !timingSafeEqual(secret, expected) || !pending.has(token)) return null;
  return token;
}

/** Strips the store's headers from what a client sent, so no client can pose as the proxy's rendering. */
export function stripStoreHeaders(headers: Headers) {
  headers.delete(RENDER_HEADER);
  headers.delete(STORE_TOKEN_HEADER);
}

async function render(pathname: string, units: UnitSystem, vendor: LibraryVendorState): Promise<StoredPage | null> {
  const port = process.env.PORT;
  if (!port) return null;
  const state = pageStoreState();
  const token = randomUUID();
  state.pending.set(token, null);
  try {
    const response = await fetch(`http://127.0.0.1:${port}${pathname}`, {
      headers: { [RENDER_HEADER]: `${state.renderSecret}.${token}`, cookie: `${UNITS_COOKIE}=${units}`, accept: "text/html" },
      redirect: "manual",
      cache: "no-store",
      signal: AbortSignal.timeout(RENDER_TIMEOUT_MS),
    });
    const type = response.headers.get("content-type") ?? "";
    if (response.status !== 200 || response.headers.has("set-cookie") || !type.startsWith("text/html")) {
      await response.body?.cancel();
      return null;
    }
    const html = await response.text();
    // The page notes itself while it renders: no note (another page, an error boundary, a 404 in the stream),
    // or a note for another vendor, and nothing is stored.
    const note = state.pending.get(token);
    if (!note || note.vendorId !== vendor.id || !html.includes(state.placeholderNonce)) return null;
    const headers = [...response.headers].filter(([name]) => KEPT_HEADERS.has(name.toLowerCase()));
    const body = storedBody(html, state.placeholderNonce);
    return { vendorId: vendor.id, generation: vendor.generation, versionId: note.versionId, body, headers, onServe: note.onServe };
  } catch {
    return null;
  } finally {
    state.pending.delete(token);
  }
}

const filling = new Map<string, Promise<StoredPage | null>>();

async function fill(key: string, pathname: string, units: UnitSystem, vendor: LibraryVendorState): Promise<StoredPage | null> {
  const fillKey = `${key} ${vendor.id} ${vendor.generation}`;
  let pending = filling.get(fillKey);
  if (!pending) {
    pending = render(pathname, units, vendor).finally(() => filling.delete(fillKey));
    filling.set(fillKey, pending);
  }
  const page = await pending;
  // Stored under the generation read before the rendering: if a change committed meanwhile, the next reader
  // sees a newer generation and has the page rendered again.
  if (page) pageStoreState().store.set(key, page);
  return page;
}

/** A stored page for this request with a fresh nonce, or null to let Next render it. */
export async function answerFromStore(request: NextRequest, slug: string, csp: (nonce: string) => string): Promise<NextResponse | null> {
  let vendor: LibraryVendorState | null;
  try {
    vendor = await findLibraryVendorState(slug);
  } catch {
    return null; // the page itself answers for a database that is down
  }
  if (!vendor || !vendor.libraryPublic) return null;
  const { store, placeholderNonce } = pageStoreState();
  const units = unitsOf(request);
  const key = pageStoreKey(request.nextUrl.pathname, units);
  let page = store.get(key);
  if (page && (page.generation !== vendor.generation || page.vendorId !== vendor.id)) {
    store.delete(key);
    store.dropStale(vendor.id, vendor.generation);
    page = undefined;
  }
  page ??= (await fill(key, request.nextUrl.pathname, units, vendor)) ?? undefined;
  if (!page) return null;
  page.onServe?.();
  const nonce = freshNonce();
  // Next names the nonce in its preload Link header too.
  const headers = new Headers(page.headers.map(([name, value]): [string, string] => [name, withNonce(value, placeholderNonce, nonce)]));
  for (const { key: name, value } of SECURITY_HEADERS) headers.set(name, value);
  headers.set("Content-Security-Policy", csp(nonce));
  headers.set("Cache-Control", NO_SHARED_CACHE);
  return new NextResponse(bodyWithNonce(page.body, nonce), { status: 200, headers });
}

/** The nonce of a rendering the proxy asked for: the placeholder the store replaces in every answer. */
export const placeholderNonce = () => pageStoreState().placeholderNonce;
