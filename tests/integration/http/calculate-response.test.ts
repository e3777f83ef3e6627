import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";

import { POST } from "@/app/api/v1/calculate/route";
import { calculateMetricExample } from "@/lib/api-docs/api-examples";

describe("calculate response", () => {
  it("asks not to be transformed, so the few kilobytes of a result go out without gzip", async () => {
    const response = await POST(
      new NextRequest("http://127.0.0.1/api/v1/calculate", {
        method: "POST",
        headers: { "content-type": "application/json", "accept-encoding": "gzip" },
        body: JSON.stringify(calculateMetricExample),
      }),
    );
    expect(response.status).toBe(200);
    expect(response.headers.get("cache-control")).toBe("no-transform");
    expect(response.headers.get("content-type")).toBe("application/json");
  });
});
