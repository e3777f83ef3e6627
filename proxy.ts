import { NextResponse, type NextRequest } from "next/server";

import {
  acceptStoreRender,
  answerFromStore,
  freshNonce,
  placeholderNonce,
  storableVendorSlug,
  STORE_TOKEN_HEADER,
  stripStoreHeaders,
} from "@/lib/library/page-store-proxy";

function contentSecurityPolicy(nonce: string) {
  const dev = process.env.NODE_ENV !== "production";
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}

// The proxy sets headers (a per-request CSP nonce) and answers anonymous Library sheet pages from the page store
// (lib/library/page-store-proxy.ts), which serves only what an anonymous reader may see; it never authorizes:
// every layout, page, action and route handler checks the session, vendor and role itself.
export async function proxy(request: NextRequest) {
  const storeToken = acceptStoreRender(request);
  if (!storeToken) {
    const slug = storableVendorSlug(request);
    const stored = slug ? await answerFromStore(request, slug, contentSecurityPolicy) : null;
    if (stored) return stored;
  }
  // A rendering for the store carries the placeholder nonce, which the store replaces in every answer.
  const nonce = storeToken ? placeholderNonce() : freshNonce();
  const csp = contentSecurityPolicy(nonce);
  const requestHeaders = new Headers(request.headers);
  stripStoreHeaders(requestHeaders);
  if (storeToken) requestHeaders.set(STORE_TOKEN_HEADER, storeToken);
  requestHeaders.set("x-nonce", nonce);
  // For a 404 page to explain itself (not-found pages get no params); set here, so a client cannot choose it.
  requestHeaders.set("x-request-path", request.nextUrl.pathname);
  requestHeaders.set("Content-Security-Policy", csp);
  const response = NextResponse.next({ request: { headers: requestHeaders } });
  response.headers.set("Content-Security-Policy", csp);
  return response;
}

export const config = {
  matcher: [{ source: "/((?!_next/static|_next/image|favicon.ico).*)" }],
};
