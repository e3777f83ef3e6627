import { describe, expect, it } from "vitest";

import { isAllowedAddress } from "@/lib/webhooks/address-policy";
import { retryDelaySeconds } from "@/lib/webhooks/webhook-settings";
import { webhookUrlProblem } from "@/lib/webhooks/webhook-url";

// Ranges from the IANA special-purpose address registries (IPv4: RFC 6890 and successors; IPv6: RFC 6890, 4193, 4291).
describe("webhook address policy", () => {
  const off = { allowLoopback: false };
  const on = { allowLoopback: true };

  it("allows public addresses", () => {
    for (const a of ["93.184.215.14", "1.1.1.1", "8.8.8.8", "2606:4700:4700::1111", "2a00:1450:4001:80b::200e"])
      expect(isAllowedAddress(a, off), a).toBe(true);
  });

  it("refuses private, loopback, link-local, shared, documentation, multicast and reserved addresses, in every spelling", () => {
    const refused = [
      "127.0.0.1",
      "127.1.2.3",
      "10.0.0.1",
      "172.16.0.1",
      "172.31.255.255",
      "192.168.1.1",
      "169.254.169.254",
      "100.64.0.1",
      "0.0.0.0",
      "192.0.2.1",
      "198.18.0.1",
      "203.0.113.9",
      "224.0.0.1",
      "255.255.255.255",
      "::1",
      "::",
      "fd12:3456::1",
      "fc00::1",
      "fe80::1",
      "fe80::1%eth0",
      "ff02::1",
      "2001:db8::1",
      "::ffff:127.0.0.1",
      "::ffff:7f00:1",
      "::ffff:a9fe:a9fe",
      "0:0:0:0:0:ffff:10.0.0.1",
      "[::1]",
      "64:ff9b::a9fe:a9fe",
      "not-an-address",
    ];
    for (const a of refused) expect(isAllowedAddress(a, off), a).toBe(false);
  });

  it("with the test flag allows loopback only", () => {
    expect(isAllowedAddress("127.0.0.1", on)).toBe(true);
    expect(isAllowedAddress("::1", on)).toBe(true);
    expect(isAllowedAddress("::ffff:127.0.0.1", on)).toBe(true);
    for (const a of ["10.0.0.1", "192.168.0.10", "169.254.169.254", "fd00::1"]) expect(isAllowedAddress(a, on), a).toBe(false);
  });

  it("wants https, and http only to a loopback host under the test flag", () => {
    expect(webhookUrlProblem("https://shop.example.com/hook", off)).toBeNull();
    expect(webhookUrlProblem("http://shop.example.com/hook", off)).toMatch(/https only/);
    expect(webhookUrlProblem("http://127.0.0.1:8080/hook", off)).toMatch(/https only/);
    expect(webhookUrlProblem("http://127.0.0.1:8080/hook", on)).toBeNull();
    expect(webhookUrlProblem("http://[::1]:8080/hook", on)).toBeNull();
    expect(webhookUrlProblem("http://shop.example.com/hook", on)).toMatch(/https only/);
    expect(webhookUrlProblem("https://a:b@shop.example.com/", off)).toMatch(/user name or password/);
  });

  it("waits double between attempts up to the cap", () => {
    const s = { retryBaseSeconds: 30, retryCapSeconds: 3600 };
    expect([2, 3, 4, 5, 6, 9].map((n) => retryDelaySeconds(n, s))).toEqual([30, 60, 120, 240, 480, 3600]);
  });
});
