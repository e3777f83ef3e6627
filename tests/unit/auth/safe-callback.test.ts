import { describe, expect, it } from "vitest";

import { safeCallbackPath, safeVendorParam } from "@/lib/http/safe-callback";

const ORIGIN = "https://portal.example";

describe("safeCallbackPath", () => {
  it("keeps same-site paths with their query and fragment", () => {
    expect(safeCallbackPath("/northbeck/desk", ORIGIN)).toBe("/northbeck/desk");
    expect(safeCallbackPath("/northbeck/library?q=acrylic#top", ORIGIN)).toBe("/northbeck/library?q=acrylic#top");
    expect(safeCallbackPath("https://portal.example/northbeck/bench", ORIGIN)).toBe("/northbeck/bench");
    expect(safeCallbackPath("northbeck/bench", ORIGIN)).toBe("/northbeck/bench");
  });

  it.each([
    "/\\evil.example",
    "/\t/evil.example",
    "/\n/evil.example",
    "\\\\evil.example",
    "//evil.example",
    "///evil.example",
    "/\\/evil.example",
    "https://evil.example",
    "https://evil.example/northbeck",
    "http://portal.example/northbeck",
    "https://portal.example.evil.example/",
    "https://portal.example@evil.example/",
    "javascript:alert(1)",
    "JavaScript:alert(1)",
    "data:text/html,<script>alert(1)</script>",
    " //evil.example",
    "\u0000//evil.example",
  ])("sends %j to the safe default", (value) => {
    expect(safeCallbackPath(value, ORIGIN)).toBe("/");
  });

  it("never returns a path a browser would read as another host", () => {
    expect(safeCallbackPath("https://portal.example//evil.example/x", ORIGIN)).toBe("/evil.example/x");
    expect(safeCallbackPath("/%2F%2Fevil.example", ORIGIN)).toBe("/%2F%2Fevil.example");
    expect(safeCallbackPath("/%5Cevil.example", ORIGIN)).toBe("/%5Cevil.example");
    for (const value of ["/%09/evil.example", "/%5C%5Cevil.example", "%2F%2Fevil.example"]) {
      const path = safeCallbackPath(value, ORIGIN);
      expect(new URL(path, ORIGIN).origin).toBe(ORIGIN);
      expect(path.startsWith("//")).toBe(false);
    }
  });

  it("falls back on anything that is not one string", () => {
    expect(safeCallbackPath(undefined, ORIGIN)).toBe("/");
    expect(safeCallbackPath(["/a", "//evil.example"], ORIGIN)).toBe("/");
    expect(safeCallbackPath("", ORIGIN, "/northbeck")).toBe("/northbeck");
  });
});

describe("safeVendorParam", () => {
  it("keeps a vendor slug and drops anything that would change the link", () => {
    expect(safeVendorParam("northbeck")).toBe("northbeck");
    expect(safeVendorParam("/evil.example")).toBeUndefined();
    expect(safeVendorParam("evil.example/x")).toBeUndefined();
    expect(safeVendorParam(undefined)).toBeUndefined();
  });
});
