import { describe, expect, it } from "vitest";

import { safeDecode } from "@/lib/http/safe-decode";

describe("safeDecode", () => {
  it("decodes valid percent-encoding and answers null for the rest", () => {
    expect(safeDecode("EM-6%2F3")).toBe("EM-6/3");
    expect(safeDecode("plain")).toBe("plain");
    for (const bad of ["%E0%A4%A", "%", "%zz", "%C0%80x%"]) expect(safeDecode(bad)).toBeNull();
  });
});
