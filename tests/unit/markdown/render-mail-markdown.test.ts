import { describe, expect, it } from "vitest";

import { renderMailMarkdown } from "@/lib/markdown/render-mail-markdown";

describe("renderMailMarkdown", () => {
  it("renders Markdown as HTML and as plain text without the marks", () => {
    const { html, text } = renderMailMarkdown(
      "Set **16000 rpm** and _F1600_.\n\n- one\n- [the sheet](https://example.com/s)\n\n```\nG1 X1\n```",
    );
    expect(html).toContain("<strong>16000 rpm</strong>");
    expect(html).toContain("<em>F1600</em>");
    expect(html).toContain('<a href="https://example.com/s">the sheet</a>');
    expect(text).toBe("Set 16000 rpm and F1600.\n\n- one\n- the sheet (https://example.com/s)\n\n    G1 X1");
    expect(text).not.toContain("**");
  });

  it("never passes raw HTML or script links", () => {
    const { html, text } = renderMailMarkdown(
      '<script>alert(1)</script>\n\n[x](javascript:alert(1)) <img src=x onerror="alert(2)">\n\n![y](https://evil.example/p.png)',
    );
    expect(html).not.toMatch(/<script|<img|javascript:|<[^>]*\sonerror=/);
    expect(html).toContain("&#x3C;script>");
    expect(text).toContain("x");
    expect(text).not.toContain("javascript:");
  });

  it("numbers ordered lists and quotes replies in the text part", () => {
    expect(renderMailMarkdown("3. a\n4. b\n\n> said").text).toBe("3. a\n4. b\n\n> said");
  });

  it("sends text past the limits as plain text in both parts", () => {
    const source = `<b>${"x".repeat(20_001)}`;
    const { html, text } = renderMailMarkdown(source);
    expect(text).toBe(source);
    expect(html.startsWith('<p style="white-space:pre-wrap">&#60;b&#62;x')).toBe(true);
  });
});
