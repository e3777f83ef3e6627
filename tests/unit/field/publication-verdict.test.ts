import { describe, expect, it } from "vitest";

import { publicationVerdict } from "@/lib/field/publication-verdict";
import { wilsonInterval } from "@/lib/field/wilson";

const Z95 = 1.959964;
const version = (number: number, failed: number, outcomes: number, publishedAt: string | null = "2026-11-01T00:00:00Z") => ({
  number,
  publishedAt,
  failed,
  outcomes,
  failure: wilsonInterval(failed, outcomes, Z95),
});

describe("publicationVerdict", () => {
  it("says failures fell only once the intervals separate", () => {
    expect(publicationVerdict([version(1, 40, 100), version(2, 5, 100)], "95 %")).toMatchObject({
      verdict: "fell",
      headline: "Failures fell after version 2 went out",
    });
  });

  it("says not yet clear while they overlap, or while the new version has no reports", () => {
    expect(publicationVerdict([version(1, 4, 10), version(2, 2, 10)], "95 %").verdict).toBe("not_yet_clear");
    expect(publicationVerdict([version(1, 4, 10), version(2, 0, 0)], "95 %")).toMatchObject({
      verdict: "not_yet_clear",
      headline: "Not yet clear whether failures fell after version 2 went out",
    });
  });

  it("says when failures rose, and compares the two latest published versions only", () => {
    expect(publicationVerdict([version(1, 40, 100), version(2, 2, 100), version(3, 40, 100)], "95 %")).toMatchObject({ verdict: "rose" });
    expect(publicationVerdict([version(1, 4, 10), version(2, 0, 0, null)], "95 %").verdict).toBe("single_version");
  });
});
