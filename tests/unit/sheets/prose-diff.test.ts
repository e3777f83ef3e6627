import { describe, expect, it } from "vitest";

import { diffProse } from "@/lib/sheets/prose-diff";

describe("diffProse", () => {
  it("marks changed words and keeps the rest", () => {
    const { words, lines } = diffProse("Use air blast.\nKeep the feed up.\n", "Use air blast.\nKeep the feed high.\n");
    expect(words.filter((p) => p.removed).map((p) => p.value)).toEqual(["up"]);
    expect(words.filter((p) => p.added).map((p) => p.value)).toEqual(["high"]);
    expect(lines.filter((p) => !p.added && !p.removed).map((p) => p.value)).toEqual(["Use air blast.\n"]);
  });
});
