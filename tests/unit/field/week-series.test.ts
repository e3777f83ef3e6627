import { describe, expect, it } from "vitest";

import { defaultTrendRange, weeksBetween, weekSeries } from "@/lib/field/week-series";
import { wilsonInterval } from "@/lib/field/wilson";

const Z95 = 1.959964;

describe("weeksBetween", () => {
  it("lists every Monday from the week of `from` to the week of `to`", () => {
    // 2 Dec 2026 is a Wednesday; 30 Nov 2026 the Monday of its week.
    expect(weeksBetween("2026-11-18", "2026-12-02")).toEqual(["2026-11-16", "2026-11-23", "2026-11-30"]);
    expect(weeksBetween("2026-12-27", "2027-01-04")).toEqual(["2026-12-21", "2026-12-28", "2027-01-04"]);
    expect(weeksBetween("2026-12-02", "2026-12-02")).toEqual(["2026-11-30"]);
  });
});

describe("weekSeries", () => {
  it("fills weeks without reports with zeros, sums versions of one week, and marks publications", () => {
    const series = weekSeries(
      [
        { week: "2026-11-16", outcomes: 4, failed: 1 },
        { week: "2026-11-16", outcomes: 6, failed: 2 },
        { week: "2026-11-30", outcomes: 2, failed: 0 },
      ],
      { from: "2026-11-16", to: "2026-12-06" },
      [
        { number: 1, publishedAt: "2026-10-01T09:00:00Z" },
        { number: 2, publishedAt: "2026-11-29T23:30:00Z" },
      ],
      Z95,
    );
    expect(series.map((w) => [w.week, w.outcomes, w.failed, w.published])).toEqual([
      ["2026-11-16", 10, 3, []],
      ["2026-11-23", 0, 0, [2]], // Sunday 29 Nov belongs to the week of Monday 23 Nov
      ["2026-11-30", 2, 0, []],
    ]);
    expect(series[0].failure).toEqual(wilsonInterval(3, 10, Z95));
    expect(series[1].failure).toEqual({ lower: 0, upper: 1, share: 0 });
  });
});

describe("defaultTrendRange", () => {
  it("covers the 26 weeks up to today's", () => {
    const range = defaultTrendRange(new Date("2026-12-02T12:00:00Z"));
    expect(range.to).toBe("2026-12-02");
    expect(weeksBetween(range.from, range.to)).toHaveLength(26);
  });
});
