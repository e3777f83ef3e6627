import { describe, expect, it } from "vitest";

import { feedSpeedCurve } from "@/lib/bench/feed-speed-curve";

describe("feedSpeedCurve", () => {
  const base = {
    machine: { minRpm: 10000, maxRpm: 20000, maxFeedMmMin: 1500 },
    diameterMm: 6,
    flutes: 2,
    chipLoadMm: 0.05,
    minChipLoadMm: 0.02,
    vcWindowMpm: [150, 300] as [number, number],
    adapted: { rpm: 15000, feedMmMin: 1500 },
    steps: 10,
  };

  it("runs vf = fz·z·n across the range, held at the machine's feed limit, with the rubbing line at fz_min", () => {
    const curve = feedSpeedCurve({ ...base, units: "metric" });
    expect(curve.points).toHaveLength(11);
    // 0.05 · 2 · 10000 = 1000 mm/min; at 20 000 rpm it would be 2000, capped at 1500.
    expect(curve.points[0]).toEqual({ rpm: 10000, feed: 1000, rubbing: 0.02 * 2 * 10000 });
    expect(curve.points[10].feed).toBe(1500);
  });

  it("shades the spindle speeds where vc is in the window (n = 1000·vc/(π·D)), clipped to the machine", () => {
    const curve = feedSpeedCurve({ ...base, units: "metric" });
    // 150 m/min at 6 mm: 7958 rpm (below the machine's 10 000); 300 m/min: 15 915 rpm.
    expect(curve.vcWindowRpm?.[0]).toBe(10000);
    expect(curve.vcWindowRpm?.[1]).toBeCloseTo((1000 * 300) / (Math.PI * 6), 9);
  });

  it("gives feeds in in/min for imperial (÷ 25.4)", () => {
    const curve = feedSpeedCurve({ ...base, units: "imperial" });
    expect(curve.maxFeed).toBeCloseTo(1500 / 25.4, 9);
    expect(curve.adapted.feed).toBeCloseTo(1500 / 25.4, 9);
  });
});
