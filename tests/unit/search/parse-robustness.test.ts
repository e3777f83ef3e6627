import fc from "fast-check";
import { describe, expect, it } from "vitest";

import { MAX_QUERY_CHARS, MAX_QUERY_TOKENS, parseQuery } from "@/search/parse";

// Control (Cc), format (Cf), surrogate (Cs) and private-use (Co) characters.
const CONTROL = /[\p{Cc}\p{Cf}\p{Cs}\p{Co}]/u;

describe("parseQuery on hostile input", () => {
  it("answers SQL-looking strings with plain words", () => {
    const q = parseQuery("'; DROP TABLE sheets; --");
    expect(q.text).toBe("drop table sheets");
    expect(q.chips).toEqual([]);
    expect(parseQuery("acrylic' OR 1=1 --").materials).toEqual(["acrylic"]);
    expect(parseQuery("acrylic' OR 1=1 --").text).toBe("1 1");
  });

  it("drops emoji from the free text and still reads the rest", () => {
    const q = parseQuery("🔥 1/8 acrylic 👍🏽 slot 🏳️‍🌈");
    expect(q.diameterMm).toBe(3.175);
    expect(q.materials).toEqual(["acrylic"]);
    expect(q.operations).toEqual(["slotting"]);
    expect(q.text).toBe("");
  });

  it("drops control characters and folds whitespace", () => {
    const q = parseQuery("\u0000sign\u0007\t\n\r  letters\u200b\u202e  \u00a0acrylic\u0085");
    expect(q.text).toBe("sign letters");
    expect(q.query).toBe("sign letters acrylic");
    expect(q.materials).toEqual(["acrylic"]);
  });

  it("cuts a 10 000-character query to the limits and says so", () => {
    const long = "acrylic ".repeat(1250);
    expect(long).toHaveLength(10_000);
    const q = parseQuery(long);
    expect(q.truncated).toBe(true);
    expect(Array.from(q.query).length).toBeLessThanOrEqual(MAX_QUERY_CHARS);
    expect(q.materials).toEqual(["acrylic"]);
    const words = parseQuery("w".repeat(10_000));
    expect(words.truncated).toBe(true);
    expect(words.text.length).toBeLessThanOrEqual(MAX_QUERY_CHARS);
  });

  it("reads at most MAX_QUERY_TOKENS words", () => {
    const q = parseQuery(`${Array.from({ length: MAX_QUERY_TOKENS }, (_, i) => `w${i}`).join(" ")} acrylic`);
    expect(q.truncated).toBe(true);
    expect(q.materials).toEqual([]);
    expect(q.text.split(" ")).toHaveLength(MAX_QUERY_TOKENS);
  });

  it("does not cut a word in half at the character limit", () => {
    const q = parseQuery(`${"ab ".repeat(66)}acrylic`); // 198 characters, then a 7-letter word
    expect(q.query.endsWith("ab")).toBe(true);
  });

  it("answers garbage", () => {
    for (const input of [
      "////",
      "....",
      "1/0",
      "--1--",
      "ø",
      "Ø Ø Ø",
      "\\x00",
      "%s%s%n",
      "${7*7}",
      "<script>alert(1)</script>",
      "NaN in",
      "1e400 mm",
    ]) {
      expect(() => parseQuery(input), input).not.toThrow();
    }
    expect(parseQuery("1e400 mm").diameterMm).toBeUndefined();
    expect(parseQuery(undefined as unknown as string).text).toBe("");
  });

  it("never throws and never leaves control characters in the text, for any string", () => {
    fc.assert(
      fc.property(fc.oneof(fc.string({ unit: "binary", maxLength: 400 }), fc.string({ unit: "grapheme", maxLength: 100 })), (input) => {
        const q = parseQuery(input);
        expect(CONTROL.test(q.text)).toBe(false);
        expect(CONTROL.test(q.query)).toBe(false);
        expect(q.text).not.toMatch(/\s{2}|^\s|\s$/);
        expect(q.diameterMm === undefined || (q.diameterMm > 0 && q.diameterMm <= 100)).toBe(true);
      }),
      { numRuns: 2000 },
    );
  });
});
