import { isLoopbackAddress } from "./address-policy";

const LOOPBACK_NAMES = new Set(["localhost", "127.0.0.1", "[::1]"]);

/**
 * The URL's form: https (or http to a loopback host when the test/dev flag is set), no user or password, no
 * fragment. Where it points is checked after DNS resolution, at creation and again at every delivery.
 */
export function webhookUrlProblem(raw: string, { allowLoopback }: { allowLoopback: boolean }): string | null {
  let url: URL;
  try {
    url = new URL(raw);
  } catch {
    return "Enter a full address starting with https://.";
  }
  if (url.username || url.password) return "The address may not carry a user name or password.";
  if (url.hash) return "The address may not carry a #fragment.";
  const loopbackHost = LOOPBACK_NAMES.has(url.hostname) || isLoopbackAddress(url.hostname);
  if (url.protocol === "https:") return null;
  if (url.protocol === "http:" && allowLoopback && loopbackHost) return null;
  return "Webhooks are delivered over https only.";
}
