import { describe, expect, it } from "vitest";

import { MARKDOWN_LIMITS, prepareMarkdown } from "@/lib/markdown/prepare-markdown";

const depthOf = (line: string) =>
  (line.match(/^(?:[ \t]*(?:>|[-*+](?=[ \t]|$)|\d{1,9}[.)](?=[ \t]|$)))*/)?.[0].match(/>|[-*+]|\d+[.)]/g) ?? []).length;

describe("prepareMarkdown", () => {
  it("leaves ordinary Markdown alone", () => {
    const source = "Hello\n\n> quoted\n> > twice\n\n- a\n  - b\n    1. c\n\n```\nG1 X1\n```";
    expect(prepareMarkdown(source)).toEqual({ kind: "markdown", text: source });
  });

  it("flattens a line's containers past the limit and lets the rest read as text", () => {
    for (const line of [`${">".repeat(5_000)} a`, `${"- ".repeat(5_000)}a`, `${"1. ".repeat(5_000)}a`, `${"> - ".repeat(2_500)}a`]) {
      const prepared = prepareMarkdown(line);
      expect(prepared.kind).toBe("markdown");
      expect(depthOf(prepared.text)).toBeLessThanOrEqual(MARKDOWN_LIMITS.maxLineDepth);
      expect(prepared.text.endsWith("a")).toBe(true);
    }
  });

  it("counts indentation towards the depth", () => {
    const prepared = prepareMarkdown(`${" ".repeat(6_000)}- a`);
    expect(prepared.text.length).toBeLessThan(40);
    expect(prepared.text.trimStart()).toBe("\\- a");
  });

  it("escapes the first marker past the limit (ordered markers keep their number)", () => {
    const prepared = prepareMarkdown(`${"1. ".repeat(40)}a`);
    expect(prepared.text).toContain("1\\. ");
  });

  it("falls back to plain text when too long or too full of delimiters", () => {
    expect(prepareMarkdown("x".repeat(MARKDOWN_LIMITS.maxLength + 1)).kind).toBe("plain");
    expect(prepareMarkdown("*".repeat(MARKDOWN_LIMITS.maxDelimiters + 1)).kind).toBe("plain");
    expect(prepareMarkdown("x".repeat(MARKDOWN_LIMITS.maxLength)).kind).toBe("markdown");
  });

  it("falls back to plain text past the line limit, counting every kind of line break", () => {
    for (const br of ["\n", "\r\n", "\r"]) {
      expect(prepareMarkdown(Array(MARKDOWN_LIMITS.maxLines).fill("a").join(br)).kind).toBe("markdown");
      expect(
        prepareMarkdown(
          Array(MARKDOWN_LIMITS.maxLines + 1)
            .fill("a")
            .join(br),
        ).kind,
      ).toBe("plain");
    }
    expect(prepareMarkdown("a\n=\n".repeat(4_999)).kind).toBe("plain");
    expect(prepareMarkdown(`> a\n${"b\n".repeat(9_996)}`).kind).toBe("plain");
  });

  it("counts code-span backticks as delimiters", () => {
    expect(prepareMarkdown("`a ``b ".repeat(2_856)).kind).toBe("plain");
  });

  it("keeps an ordinary ticket formatted", () => {
    const ticket = [
      "# Chatter on the 6 mm end mill",
      "",
      "Setup **B2**, see [the sheet](https://example.com/sheet) and `fz = 0.04`.",
      "",
      "- slotting at ap = 6",
      "- profiling at ae = 1.5",
      "",
      "1. first pass",
      "2. second pass",
      "",
      "```",
      "G1 X10 F800",
      "```",
      "",
      "| n | vf |",
      "|---|----|",
      "| 18000 | 1440 |",
      "",
      "> quoted from the last reply",
    ].join("\n");
    expect(prepareMarkdown(ticket)).toEqual({ kind: "markdown", text: ticket });
  });

  it("does not treat U+2028 or U+2029 as line breaks", () => {
    expect(prepareMarkdown("# a\u2028b")).toEqual({ kind: "markdown", text: "# a\u2028b" });
  });
});
