import { describe, expect, it } from "vitest";

import { backoffSeconds, retriesToCover } from "@/lib/jobs/backoff";

describe("capped backoff", () => {
  it("doubles from the base and stops at the cap", () => {
    const s = { baseSeconds: 60, capSeconds: 3_600 };
    expect([0, 1, 2, 5, 6, 7, 40].map((a) => backoffSeconds(a, s))).toEqual([60, 120, 240, 1_920, 3_600, 3_600, 3_600]);
  });

  it("retries mail for at least 48 hours with the default schedule", () => {
    const schedule = { baseSeconds: 60, capSeconds: 3_600, windowSeconds: 50 * 3_600 };
    const retries = retriesToCover(schedule);
    const total = Array.from({ length: retries }, (_, a) => backoffSeconds(a, schedule)).reduce((x, y) => x + y, 0);
    expect(total).toBeGreaterThanOrEqual(48 * 3_600);
    // One fewer retry would not cover the window: the count is the smallest that does.
    expect(total - backoffSeconds(retries - 1, schedule)).toBeLessThan(schedule.windowSeconds);
  });
});
