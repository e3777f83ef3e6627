import { describe, expect, it } from "vitest";

import { compareVersions } from "@/lib/field/compare-versions";
import { wilsonInterval, type Interval } from "@/lib/field/wilson";

// z for 95 % two-sided, from a standard normal table (common practice).
const Z95 = 1.959964;

const version = (number: number, failed: number, outcomes: number) => ({
  number,
  failed,
  outcomes,
  failure: wilsonInterval(failed, outcomes, Z95),
});
const withInterval = (number: number, failed: number, outcomes: number, failure: Interval) => ({ number, failed, outcomes, failure });

describe("compareVersions", () => {
  it("v1 failed 8/10, v2 failed 1/14: the 95 % intervals do not overlap, so fewer failures", () => {
    const v1 = version(1, 8, 10);
    const v2 = version(2, 1, 14);
    // Wilson (1927) at 95 %: 8/10 → 0.49–0.94, 1/14 → 0.01–0.31 (hand-derived).
    expect(v2.failure.upper).toBeLessThan(v1.failure.lower);
    const result = compareVersions(v1, v2, "95 %");
    expect(result.verdict).toBe("fewer_failures");
    expect(result.sentence).toBe(
      "Version 2 failed in 1 of 14 reports (1 %–31 %); version 1 failed in 8 of 10 reports (49 %–94 %). Fewer failures: the 95 % intervals do not overlap.",
    );
  });

  it("the other way round is more failures", () => {
    const result = compareVersions(version(3, 1, 14), version(4, 8, 10), "95 %");
    expect(result.verdict).toBe("more_failures");
    expect(result.sentence).toMatch(
      /^Version 4 failed in 8 of 10 reports .*; version 3 failed in 1 of 14 reports .*\. More failures: the 95 % intervals do not overlap\.$/,
    );
  });

  it("3/3 vs 0/3: the raw shares differ completely but the intervals overlap, so unclear", () => {
    const result = compareVersions(version(1, 3, 3), version(2, 0, 3), "95 %");
    expect(result.verdict).toBe("unclear");
    expect(result.sentence).toContain("Not yet clear: the 95 % intervals overlap, so more reports are needed.");
  });

  it("intervals that only touch count as overlapping", () => {
    const prev = withInterval(1, 5, 10, { lower: 0.3, upper: 0.7, share: 0.5 });
    expect(compareVersions(prev, withInterval(2, 1, 10, { lower: 0.05, upper: 0.3, share: 0.1 }), "95 %").verdict).toBe("unclear");
    expect(compareVersions(prev, withInterval(2, 9, 10, { lower: 0.7, upper: 0.95, share: 0.9 }), "95 %").verdict).toBe("unclear");
    expect(compareVersions(prev, withInterval(2, 1, 10, { lower: 0.05, upper: 0.299, share: 0.1 }), "95 %").verdict).toBe("fewer_failures");
  });

  it("uses the confidence label it is given", () => {
    expect(compareVersions(version(1, 8, 10), version(2, 1, 14), "90 %").sentence).toContain("the 90 % intervals do not overlap");
  });

  it("no reports on the current version gives no_reports naming that version", () => {
    expect(compareVersions(version(1, 2, 10), version(2, 0, 0), "95 %")).toEqual({
      verdict: "no_reports",
      sentence: "No comparison yet: version 2 has no outcome reports.",
    });
  });

  it("no reports on the previous version gives no_reports naming that version", () => {
    expect(compareVersions(version(1, 0, 0), version(2, 2, 10), "95 %")).toEqual({
      verdict: "no_reports",
      sentence: "No comparison yet: version 1 has no outcome reports.",
    });
  });
});
