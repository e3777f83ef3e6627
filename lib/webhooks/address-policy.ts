import { BlockList, isIP } from "node:net";

// Addresses a webhook may never reach: private, loopback, link-local, shared, documentation, multicast and
// reserved ranges, so the feature cannot probe the network the app runs in.
const blocked = new BlockList();
for (const [net, prefix] of [
  ["0.0.0.0", 8],
  ["10.0.0.0", 8],
  ["100.64.0.0", 10],
  ["127.0.0.0", 8],
  ["169.254.0.0", 16],
  ["172.16.0.0", 12],
  ["192.0.0.0", 24],
  ["192.0.2.0", 24],
  ["192.88.99.0", 24],
  ["192.168.0.0", 16],
  ["198.18.0.0", 15],
  ["198.51.100.0", 24],
  ["203.0.113.0", 24],
  ["224.0.0.0", 4],
  ["240.0.0.0", 4],
] as const)
  blocked.addSubnet(net, prefix, "ipv4");
for (const [net, prefix] of [
  ["::", 128],
  ["::1", 128],
  ["64:ff9b::", 96],
  ["64:ff9b:1::", 48],
  ["100::", 64],
  ["2001::", 23],
  ["2001:db8::", 32],
  ["2002::", 16],
  ["fc00::", 7],
  ["fe80::", 10],
  ["fec0::", 10],
  ["ff00::", 8],
] as const)
  blocked.addSubnet(net, prefix, "ipv6");

const loopback = new BlockList();
loopback.addSubnet("127.0.0.0", 8, "ipv4");
loopback.addAddress("::1", "ipv6");

/** An IPv4 address written inside IPv6 (::ffff:a.b.c.d or ::ffff:xxxx:xxxx) is judged as IPv4. */
function normalise(address: string): { address: string; type: "ipv4" | "ipv6" } | null {
  const bare = address.replace(/^\[|\]$/g, "").replace(/%.*$/, "");
  const version = isIP(bare);
  if (version === 4) return { address: bare, type: "ipv4" };
  if (version !== 6) return null;
  const mapped = bare.toLowerCase().match(/^(?:0{0,4}:){0,5}:?ffff:(.+)$/);
  if (mapped) {
    const tail = mapped[1];
    if (isIP(tail) === 4) return { address: tail, type: "ipv4" };
    const hex = tail.match(/^([0-9a-f]{1,4}):([0-9a-f]{1,4})$/);
    if (hex) {
      const n = (parseInt(hex[1], 16) << 16) | parseInt(hex[2], 16);
      return { address: [n >>> 24, (n >>> 16) & 255, (n >>> 8) & 255, n & 255].join("."), type: "ipv4" };
    }
  }
  return { address: bare, type: "ipv6" };
}

export function isLoopbackAddress(address: string): boolean {
  const n = normalise(address);
  return n !== null && loopback.check(n.address, n.type);
}

/** True when a webhook may connect to this address (loopback only when the test/dev flag allows it). */
export function isAllowedAddress(address: string, { allowLoopback }: { allowLoopback: boolean }): boolean {
  const n = normalise(address);
  if (!n) return false;
  if (allowLoopback && loopback.check(n.address, n.type)) return true;
  return !blocked.check(n.address, n.type);
}
