import http from "node:http";
import type { AddressInfo } from "node:net";
import { describe, expect, it } from "vitest";

import { clientIp, trustedProxies } from "@/lib/http/client-ip";
import { recordPeerAddress } from "@/lib/http/record-peer-address";

const stamped = (peer: string, forwarded = "") => ({
  "x-swarfbook-peer": peer,
  "x-swarfbook-forwarded-for": forwarded,
  "x-forwarded-for": forwarded || peer,
});

describe("clientIp", () => {
  it("with no trusted proxies, the TCP peer is the client whatever X-Forwarded-For says", () => {
    const none = trustedProxies("");
    expect(clientIp(stamped("203.0.113.9", "1.2.3.4"), none)).toBe("203.0.113.9");
    expect(clientIp(stamped("::ffff:203.0.113.9", "1.2.3.4, 5.6.7.8"), none)).toBe("203.0.113.9");
    expect(clientIp(stamped("203.0.113.9"), none)).toBe("203.0.113.9");
  });

  it("believes forwarded hops only as far as they come from trusted proxies, counted from the right", () => {
    const lb = trustedProxies("127.0.0.1, 10.0.0.0/8");
    // HAProxy on loopback appends what it saw: the entries left of it are the client's own writing.
    expect(clientIp(stamped("127.0.0.1", "6.6.6.6, 198.51.100.7"), lb)).toBe("198.51.100.7");
    // Two trusted hops (loopback balancer behind an internal one).
    expect(clientIp(stamped("127.0.0.1", "6.6.6.6, 198.51.100.7, 10.1.2.3"), lb)).toBe("198.51.100.7");
    // A request that reaches the app directly from outside is not believed about anything.
    expect(clientIp(stamped("198.51.100.8", "127.0.0.1, 10.0.0.1"), lb)).toBe("198.51.100.8");
    // Only trusted hops: the leftmost is as far as we can see.
    expect(clientIp(stamped("127.0.0.1", "10.0.0.5"), lb)).toBe("10.0.0.5");
    expect(clientIp(stamped("127.0.0.1"), lb)).toBe("127.0.0.1");
  });

  it("ignores a client's own copy of the stamp headers once the server has stamped the request", async () => {
    recordPeerAddress();
    const server = http.createServer((req, res) => res.end(clientIp(req.headers, trustedProxies(""))));
    await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
    try {
      const { port } = server.address() as AddressInfo;
      const answers = await Promise.all(
        ["1.1.1.1", "2.2.2.2", "3.3.3.3"].map(async (ip) =>
          (
            await fetch(`http://127.0.0.1:${port}/`, {
              headers: { "x-forwarded-for": ip, "x-swarfbook-peer": ip, "x-swarfbook-forwarded-for": ip },
            })
          ).text(),
        ),
      );
      expect(answers).toEqual(["127.0.0.1", "127.0.0.1", "127.0.0.1"]);
    } finally {
      await new Promise((resolve) => server.close(resolve));
    }
  });

  it("keys an IPv6 client by its /64, so one host cannot rotate through its addresses", () => {
    const none = trustedProxies("");
    expect(clientIp(stamped("2001:db8:1:2::1"), none)).toBe("2001:db8:1:2::/64");
    expect(clientIp(stamped("2001:0DB8:0001:0002:ffff:1:2:3"), none)).toBe("2001:db8:1:2::/64");
    expect(clientIp(stamped("2001:db8:1:2:abcd::9"), none)).toBe("2001:db8:1:2::/64");
    expect(clientIp(stamped("2001:db8::1"), none)).toBe("2001:db8:0:0::/64");
    expect(clientIp(stamped("::1"), none)).toBe("0:0:0:0::/64");
    expect(clientIp(stamped("2001:db8:1:3::1"), none)).not.toBe(clientIp(stamped("2001:db8:1:2::1"), none));
    expect(clientIp(stamped("::ffff:198.51.100.4"), none)).toBe("198.51.100.4");
    expect(clientIp(stamped("198.51.100.4"), none)).toBe("198.51.100.4");
  });

  it("refuses a malformed TRUSTED_PROXIES entry with a clear message", () => {
    expect(() => trustedProxies("127.0.0.1, proxy.internal")).toThrow(
      'TRUSTED_PROXIES: "proxy.internal" is not an IP address or CIDR range.',
    );
    expect(() => trustedProxies("10.0.0.0/8/1")).toThrow("TRUSTED_PROXIES");
  });
});
