import { describe, expect, it } from "vitest";

import { unsafeAttributeReason, unsafeUrlReason } from "@/lib/mdx/url-safety";

describe("URL safety", () => {
  it.each([
    "javascript:alert(1)",
    " JAVASCRIPT:alert(1)",
    "java\tscript:alert(1)",
    "java\nscript:x",
    "vbscript:x",
    "data:text/html,<script>",
  ])("refuses %j as a link", (url) => expect(unsafeUrlReason(url, "link")).toBeDefined());

  it("allows web, mail and relative links, and only https or relative images", () => {
    for (const url of ["https://a.example", "http://a.example", "mailto:a@b.example", "../x", "#adapt", "x?y=z:1"]) {
      expect(unsafeUrlReason(url, "link")).toBeUndefined();
    }
    expect(unsafeUrlReason("http://a.example/x.png", "image")).toBeDefined();
    expect(unsafeUrlReason("https://a.example/x.png", "image")).toBeUndefined();
    expect(unsafeUrlReason("ftp://a.example/x", "link")).toBeDefined();
  });

  it("treats URL attributes strictly and text attributes by whether the scheme is glued on", () => {
    expect(unsafeAttributeReason("href", "javascript: alert(1)")).toBeDefined();
    expect(unsafeAttributeReason("title", "javascript:alert(1)")).toBeDefined();
    expect(unsafeAttributeReason("title", "Data: keep the guard on")).toBeUndefined();
  });
});
