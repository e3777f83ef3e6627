import { describe, expect, it } from "vitest";

import { ApiError, retryDelayMs } from "@/lib/swr/retry";

describe("SWR retries", () => {
  it("retries a 503 after its Retry-After, and a lost connection with capped backoff", () => {
    expect(retryDelayMs(new ApiError(503, 5), 1)).toBe(5_000);
    expect(retryDelayMs(new ApiError(503, null), 3)).toBe(4_000);
    expect(retryDelayMs(new TypeError("fetch failed"), 7)).toBe(30_000);
  });

  it("does not retry an answer about the request itself, nor forever", () => {
    expect(retryDelayMs(new ApiError(404, null), 1)).toBeNull();
    expect(retryDelayMs(new ApiError(400, null), 1)).toBeNull();
    expect(retryDelayMs(new ApiError(503, 5), 9)).toBeNull();
  });
});
