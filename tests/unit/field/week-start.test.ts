import { describe, expect, it, vi } from "vitest";

// digest-content.ts imports server-side DB modules (through the digest queries). Constructing the knex instance opens no
// connection, but to be certain no database client is created at all, those modules are replaced here:
// weekStartOf itself is pure.
vi.mock("@/lib/db/knex", () => ({ db: {} }));
vi.mock("@/lib/jobs/boss", () => ({ getBoss: () => Promise.reject(new Error("no job queue in unit tests")) }));

const { weekStartOf } = await import("@/lib/field/digest-content");

describe("weekStartOf", () => {
  it.each([
    ["2026-12-07T00:00:00Z", "2026-12-07"], // Monday, start of day
    ["2026-12-07T23:59:59Z", "2026-12-07"], // Monday, end of day
    ["2026-12-09T12:00:00Z", "2026-12-07"], // Wednesday
    ["2026-12-13T23:59:59.999Z", "2026-12-07"], // Sunday, last instant of the week
    ["2026-12-06T10:00:00Z", "2026-11-30"], // Sunday belongs to the week that began the Monday before
    ["2027-01-01T08:00:00Z", "2026-12-28"], // across a year boundary
    ["2024-03-01T00:00:00Z", "2024-02-26"], // across a leap day
  ])("%s → %s", (at, monday) => {
    expect(weekStartOf(new Date(at))).toBe(monday);
  });

  it("works in UTC, not local time: Monday 00:30 at UTC+2 is still Sunday in UTC", () => {
    expect(weekStartOf(new Date("2026-12-07T00:30:00+02:00"))).toBe("2026-11-30");
  });

  it("always returns a Monday on or before the date, at most 6 days earlier", () => {
    for (let day = 0; day < 60; day++) {
      const at = new Date(Date.UTC(2026, 10, 1 + day, 15));
      const monday = new Date(`${weekStartOf(at)}T00:00:00Z`);
      expect(monday.getUTCDay()).toBe(1);
      const daysBack = (at.getTime() - monday.getTime()) / 86_400_000;
      expect(daysBack).toBeGreaterThanOrEqual(0);
      expect(daysBack).toBeLessThan(7);
    }
  });
});
