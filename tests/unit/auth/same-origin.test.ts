import { describe, expect, it } from "vitest";

import { isSameOriginChange } from "@/lib/http/same-origin";

const allowed = ["https://portal.example"];

describe("isSameOriginChange", () => {
  it("lets reads through without an Origin", () => {
    for (const method of ["GET", "HEAD", "OPTIONS", "get"]) expect(isSameOriginChange({ method, origin: null, allowed })).toBe(true);
  });

  it("accepts a change only from the app's own origin", () => {
    expect(isSameOriginChange({ method: "POST", origin: "https://portal.example", allowed })).toBe(true);
    for (const origin of [
      null,
      "null",
      "https://evil.example",
      "http://portal.example",
      "https://portal.example.evil.example",
      "https://portal.example:8443",
    ]) {
      for (const method of ["POST", "PUT", "PATCH", "DELETE"]) expect(isSameOriginChange({ method, origin, allowed })).toBe(false);
    }
  });
});
