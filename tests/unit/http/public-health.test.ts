import { describe, expect, it } from "vitest";

import { publicHealth } from "@/lib/http/public-health";

describe("the public health answer", () => {
  it("gives states and figures but never a driver's error text", () => {
    const leaky = "connect ECONNREFUSED 10.0.0.5:5433 (user swarfbook_reader)";
    const answer = publicHealth({
      database: "up",
      queue: { state: "failing", attempts: 3, lastError: leaky, since: "2026-12-02T08:00:00.000Z" },
      replica: { configured: true, usable: false, lagSeconds: null, checkedAt: "2026-12-02T08:00:00.000Z", error: leaky },
    });
    expect(JSON.stringify(answer)).not.toContain("ECONNREFUSED");
    expect(answer).toMatchObject({
      ok: true,
      database: "up",
      queue: { state: "failing", attempts: 3 },
      replica: { configured: true, usable: false },
    });
  });
});
