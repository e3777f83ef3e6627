import { vendorSlugSchema } from "@/lib/vendors/reserved-slugs";

// Pure: where to go after signing in. The browser resolves a callback the way `new URL` does (backslashes as
// slashes, tabs and newlines dropped), so the value is resolved against the app's own origin the same way and
// kept only when it stays there; only its path, query and fragment are passed on.

export function safeCallbackPath(value: unknown, origin: string, fallback = "/"): string {
  if (typeof value !== "string" || !value) return fallback;
  let url: URL;
  try {
    url = new URL(value, origin);
  } catch {
    return fallback;
  }
  if (url.origin !== new URL(origin).origin) return fallback;
  // A path of "//host" would read as another host when it is followed; one slash keeps it on this site.
  const path = url.pathname.replace(/^\/{2,}/, "/");
  return `${path}${url.search}${url.hash}`;
}

/** A vendor slug from the query string, or undefined when it is not one (it ends up in a link). */
export function safeVendorParam(value: unknown): string | undefined {
  const parsed = vendorSlugSchema.safeParse(value);
  return parsed.success ? parsed.data : undefined;
}
