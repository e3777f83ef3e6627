import { describe, expect, it } from "vitest";

import { errorResponse } from "@/lib/http/error-response";

describe("the one error mapping", () => {
  it("answers 503 with Retry-After when the database is unavailable", async () => {
    const response = errorResponse(Object.assign(new Error("connect ECONNREFUSED 127.0.0.1:5432"), { code: "ECONNREFUSED" }));
    expect(response.status).toBe(503);
    expect(response.headers.get("retry-after")).toBe("5");
    expect(await response.json()).toEqual({ error: "unavailable", message: "Swarfbook is catching up; try again in a moment." });
  });

  it("still answers 500 for anything else, without a stack trace", async () => {
    const response = errorResponse(new TypeError("x is undefined"));
    expect(response.status).toBe(500);
    expect(JSON.stringify(await response.json())).not.toContain("TypeError");
  });
});
