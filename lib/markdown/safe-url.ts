// Pure: the only links untrusted text may carry are absolute http(s) and mailto addresses.
const ALLOWED = new Set(["http:", "https:", "mailto:"]);

/** The normalised URL when it is an absolute http(s) or mailto address, otherwise undefined (no link). */
export function safeUrl(value: string): string | undefined {
  try {
    const url = new URL(value.trim());
    return ALLOWED.has(url.protocol) ? url.href : undefined;
  } catch {
    return undefined;
  }
}
