import "server-only";

import { Forbidden } from "@/lib/errors/domain-errors";

import { appUrl } from "./app-url";

// A browser attaches the session cookie to a request another site starts, but it always names that site in
// `Origin` on a POST, PUT, PATCH or DELETE. So a cookie-authenticated change is accepted only with the app's own
// origin there; scripts authenticate with a personal access token and need no Origin.

const READS = new Set(["GET", "HEAD", "OPTIONS"]);

export function isSameOriginChange({ method, origin, allowed }: { method: string; origin: string | null; allowed: string[] }): boolean {
  if (READS.has(method.toUpperCase())) return true;
  return origin !== null && allowed.includes(origin);
}

/** Throws 403 when a cookie-authenticated change does not come from the app's own pages. */
export function requireSameOrigin(request: Request): void {
  const allowed = [new URL(appUrl("/")).origin, new URL(request.url).origin];
  if (!isSameOriginChange({ method: request.method, origin: request.headers.get("origin"), allowed })) {
    throw new Forbidden(
      "This change must come from a Swarfbook page of this site (the Origin header is missing or names another site). Scripts sign in with a personal access token instead.",
    );
  }
}
