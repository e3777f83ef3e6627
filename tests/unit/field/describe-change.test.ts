import { describe, expect, it } from "vitest";

import { describeChange, type ChangeRollup } from "@/lib/field/describe-change";

const change = (overrides: Partial<ChangeRollup> = {}): ChangeRollup => ({
  param: "feedMmMin",
  reports: 23,
  medianPct: -18,
  q1Pct: -25,
  q3Pct: -10,
  lowered: 20,
  raised: 3,
  ...overrides,
});

describe("describeChange", () => {
  it("describes a lowered parameter with its label, median, agreement and spread", () => {
    expect(describeChange(change())).toBe(
      "vf (feed rate) lowered by a median of 18 % in 23 reports (20 of 23 lowered it; the middle half of reports ran −25 % to −10 %)",
    );
  });

  it("describes a raised parameter and counts the reports that raised it", () => {
    expect(describeChange(change({ param: "rpm", reports: 8, medianPct: 12, q1Pct: 5, q3Pct: 20, lowered: 1, raised: 7 }))).toBe(
      "n (spindle speed) raised by a median of 12 % in 8 reports (7 of 8 raised it; the middle half of reports ran +5 % to +20 %)",
    );
  });

  it("signs a spread that crosses zero with a true minus sign (U+2212) and a plus", () => {
    const sentence = describeChange(
      change({ param: "axialDepthMm", reports: 6, medianPct: -4, q1Pct: -9, q3Pct: 2.5, lowered: 4, raised: 2 }),
    );
    expect(sentence).toBe(
      "ap (axial depth) lowered by a median of 4 % in 6 reports (4 of 6 lowered it; the middle half of reports ran −9 % to +2.5 %)",
    );
    expect(sentence).not.toContain("-9");
  });

  it("keeps one decimal below 10 % and rounds to whole percent from 10 %", () => {
    expect(describeChange(change({ medianPct: -7.4, reports: 2, lowered: 2, raised: 0 }))).toContain("by a median of 7.4 % in 2 reports");
    expect(describeChange(change({ medianPct: -18.4, reports: 2, lowered: 2, raised: 0 }))).toContain("by a median of 18 % in 2 reports");
  });

  it("uses the singular for one report and shows no spread", () => {
    expect(
      describeChange(change({ param: "radialDepthMm", reports: 1, medianPct: -30, q1Pct: -30, q3Pct: -30, lowered: 1, raised: 0 })),
    ).toBe("ae (radial depth) lowered by a median of 30 % in 1 report (1 of 1 lowered it)");
  });

  it("shows the spread only from 4 reports on", () => {
    expect(describeChange(change({ reports: 3, lowered: 3, raised: 0 }))).not.toContain("middle half");
    expect(describeChange(change({ reports: 3, lowered: 3, raised: 0 }))).toBe(
      "vf (feed rate) lowered by a median of 18 % in 3 reports (3 of 3 lowered it)",
    );
    expect(describeChange(change({ reports: 4, lowered: 4, raised: 0 }))).toContain("; the middle half of reports ran −25 % to −10 %)");
  });

  it("says 'changed both ways' when the median is near zero", () => {
    expect(describeChange(change({ param: "plungeFeedMmMin", reports: 6, medianPct: 0.04, lowered: 3, raised: 3 }))).toBe(
      "Plunge feed changed both ways, median ±0 % in 6 reports (3 lowered, 3 raised)",
    );
    expect(describeChange(change({ reports: 1, medianPct: -0.049, lowered: 0, raised: 1 }))).toBe(
      "vf (feed rate) changed both ways, median ±0 % in 1 report (0 lowered, 1 raised)",
    );
  });

  it("a small but not near-zero median is still a direction", () => {
    expect(describeChange(change({ reports: 5, medianPct: 0.3, q1Pct: -1, q3Pct: 2, lowered: 2, raised: 3 }))).toMatch(
      /^vf \(feed rate\) raised by a median of 0\.3 % in 5 reports \(3 of 5 raised it;/,
    );
  });

  it("falls back to the raw parameter name when it has no label", () => {
    expect(describeChange(change({ param: "coolantBar", reports: 2, lowered: 2, raised: 0 }))).toMatch(
      /^coolantBar lowered by a median of 18 %/,
    );
  });
});
