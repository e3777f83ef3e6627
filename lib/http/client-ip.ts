import { BlockList, isIP } from "node:net";

import { FORWARDED_HEADER, PEER_HEADER } from "./peer-address-headers";

type HeaderSource = Headers | Record<string, string | string[] | undefined>;

const normalise = (address: string) => {
  const a = address.trim().replace(/^\[|\]$/g, "");
  return a.toLowerCase().startsWith("::ffff:") && isIP(a.slice(7)) === 4 ? a.slice(7) : a;
};

/**
 * One household or data-centre host gets a whole IPv6 /64, so a limit keyed by the full address would give it
 * billions of fresh buckets: an IPv6 client is keyed by its /64 ("2001:db8:1:2::/64"), in canonical form.
 */
function rateLimitKeyOf(address: string): string {
  if (isIP(address) !== 6) return address;
  const [head, tail = ""] = address.toLowerCase().split("%")[0].split("::");
  const groups = (part: string) => (part ? part.split(":").flatMap((g) => (g.includes(".") ? ["0", "0"] : [g])) : []);
  const left = groups(head);
  const right = address.includes("::") ? groups(tail) : [];
  const full = [...left, ...Array(Math.max(0, 8 - left.length - right.length)).fill("0"), ...right];
  return `${full
    .slice(0, 4)
    .map((g) => g.replace(/^0+(?=.)/, ""))
    .join(":")}::/64`;
}

let cached: { source: string; list: BlockList } | null = null;

/** TRUSTED_PROXIES: comma-separated addresses or CIDR ranges of the proxies in front of the app (none by default). */
export function trustedProxies(source = process.env.TRUSTED_PROXIES ?? ""): BlockList {
  if (cached?.source === source) return cached.list;
  const list = new BlockList();
  for (const entry of source
    .split(",")
    .map((e) => e.trim())
    .filter(Boolean)) {
    const [address, bits, extra] = entry.split("/");
    const family = isIP(normalise(address));
    if (!family || extra !== undefined || (bits !== undefined && !/^\d{1,3}$/.test(bits))) {
      throw new Error(`TRUSTED_PROXIES: "${entry}" is not an IP address or CIDR range.`);
    }
    const type = family === 4 ? "ipv4" : "ipv6";
    if (bits === undefined) list.addAddress(normalise(address), type);
    else list.addSubnet(normalise(address), Number(bits), type);
  }
  cached = { source, list };
  return list;
}

const isTrusted = (list: BlockList, address: string) => {
  const family = isIP(address);
  return family !== 0 && list.check(address, family === 4 ? "ipv4" : "ipv6");
};

/**
 * The client's address for rate limits. The hops are the X-Forwarded-For entries followed by the TCP peer;
 * counted from the right, an address is skipped only while it is a trusted proxy, so a client can prepend
 * whatever it likes without changing the answer. With no trusted proxies the TCP peer is the client. IPv4 and
 * IPv4-mapped IPv6 answer the IPv4 address; other IPv6 addresses answer their /64.
 */
export function clientIp(headers: HeaderSource, trusted: BlockList = trustedProxies()): string {
  const get = (name: string): string | undefined => {
    if (headers instanceof Headers) return headers.get(name) ?? undefined;
    const value = headers[name];
    return Array.isArray(value) ? value.join(", ") : value;
  };
  const peer = get(PEER_HEADER);
  const hops =
    peer !== undefined
      ? [...(get(FORWARDED_HEADER) ?? "").split(","), peer]
      : // Not stamped (a process without the instrumentation hook): Next's x-forwarded-for, whose last entry is
        // the socket's when the client sent none.
        (get("x-forwarded-for") ?? "").split(",");
  const chain = hops.map(normalise).filter(Boolean);
  let client = chain.pop();
  while (client && isTrusted(trusted, client) && chain.length) client = chain.pop();
  return rateLimitKeyOf(client ?? "local").slice(0, 64);
}
