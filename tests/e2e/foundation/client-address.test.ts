import { afterAll, describe, expect, it } from "vitest";

import { closeE2eDb, e2eDb } from "../support/db";
import { BASE_URL } from "../support/env";

// Against the running production server (`next start`): Next's own server fills x-forwarded-for from the socket
// only when a request has none, so a client-written header would hide the socket's address. The app stamps the
// TCP peer itself (instrumentation.ts → lib/http/record-peer-address.ts); this checks that the stamp reaches a
// route handler and that a forged X-Forwarded-For is not believed (the test run trusts no proxies).
describe("client address behind next start", () => {
  afterAll(closeE2eDb);

  it("counts requests with rotating X-Forwarded-For under the socket's address, not the forged ones", async () => {
    const forged = Array.from({ length: 12 }, (_, i) => `203.0.113.${100 + i}`);
    for (const ip of forged) {
      const response = await fetch(`${BASE_URL}/api/v1/vendors/northbeck/logo`, {
        headers: { "x-forwarded-for": ip, "x-swarfbook-peer": ip },
      });
      expect([200, 404]).toContain(response.status);
    }
    const keys: string[] = await e2eDb()("rate_limit_buckets").where("key", "like", "api:all:%").pluck("key");
    expect(keys.filter((k) => k.includes("203.0.113."))).toEqual([]);
    expect(keys).toContain("api:all:127.0.0.1");
  });
});
