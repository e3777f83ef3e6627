import { describe, expect, it } from "vitest";

import { readAttentionFilter, readTrendRange } from "@/lib/field/read-filters";

describe("Field-results search params", () => {
  it("reads a date range and a machine class; empty fields mean no filter", () => {
    expect(readAttentionFilter({ from: "2026-10-01", to: "2026-11-30", class: "light-router" })).toEqual({
      filter: { from: "2026-10-01", to: "2026-11-30", class: "light-router" },
      error: null,
    });
    expect(readAttentionFilter({ from: "", to: "", class: "" })).toEqual({ filter: {}, error: null });
  });

  it("answers wrong values with a sentence and drops the filter", () => {
    expect(readAttentionFilter({ from: "yesterday" }).error).toMatch(/YYYY-MM-DD/);
    expect(readAttentionFilter({ from: "2026-12-01", to: "2026-11-01" }).error).toMatch(/end date is before the start date/);
    expect(readAttentionFilter({ class: "<script>" }).error).toMatch(/machine class/);
    expect(readAttentionFilter({ from: "2020-01-01", to: "2026-01-01" }).error).toMatch(/three years/);
  });

  it("fills the trends range from the last 26 weeks", () => {
    const today = new Date("2026-12-02T10:00:00Z");
    expect(readTrendRange({}, today).range).toEqual({ from: "2026-06-08", to: "2026-12-02" });
    expect(readTrendRange({ from: "2026-11-01" }, today).range).toEqual({ from: "2026-11-01", to: "2026-12-02" });
    expect(readTrendRange({ from: "2001-01-01" }, today)).toMatchObject({
      range: { from: "2026-06-08" },
      error: expect.stringMatching(/three years/),
    });
    expect(readTrendRange({ from: "2026-13-01" }, today)).toMatchObject({
      range: { to: "2026-12-02" },
      error: expect.stringMatching(/Showing the last 26 weeks/),
    });
  });
});
