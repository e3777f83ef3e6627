import { describe, expect, it } from "vitest";

import { vendorSlugSchema } from "@/lib/vendors/reserved-slugs";

describe("vendor slugs", () => {
  it("accepts lower-case names with single dashes", () => {
    for (const slug of ["northbeck", "quillon", "tool-co-2", "ab"]) expect(vendorSlugSchema.safeParse(slug).success).toBe(true);
  });

  it("refuses the platform's own paths and malformed names", () => {
    for (const slug of ["api", "operator", "sign-in", "_next", "-lead", "trail-", "a", "has space", "../x", "x".repeat(41)]) {
      expect(vendorSlugSchema.safeParse(slug).success, slug).toBe(false);
    }
  });

  it("folds case so a shouted slug finds the same vendor", () => {
    expect(vendorSlugSchema.parse("NorthBeck")).toBe("northbeck");
  });
});
