import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";

import { SafeMarkdown } from "@/components/support/safe-markdown";

const html = (source: string) => renderToStaticMarkup(<SafeMarkdown source={source} />);

describe("SafeMarkdown", () => {
  it("shows raw HTML as text, never as markup", () => {
    const out = html('<script>alert(1)</script> <img src=x onerror="alert(2)">');
    expect(out).not.toContain("<script");
    expect(out).not.toContain("<img");
    expect(out).toContain("&lt;script&gt;");
  });

  it("links http(s) and mailto only; other schemes keep their text without a link", () => {
    const out = html(
      "[sheet](https://example.com/a) [mail](mailto:a@example.com) [bad](javascript:alert(1)) [data](data:text/html,x) [rel](/northbeck/library)",
    );
    expect(out).toContain('href="https://example.com/a"');
    expect(out).toContain('href="mailto:a@example.com"');
    expect(out).not.toMatch(/javascript:|data:text|href="\/northbeck/);
    expect(out).toContain("<span>bad</span>");
    expect(out).toContain('rel="noopener noreferrer nofollow"');
  });

  it("turns images into links, so opening a ticket loads nothing from elsewhere", () => {
    const out = html("![spindle](https://example.com/spindle.jpg)");
    expect(out).not.toContain("<img");
    expect(out).toContain('<a href="https://example.com/spindle.jpg"');
    expect(out).toContain(">spindle</a>");
  });

  it("renders paragraphs, lists, code, bold, quotes and tables", () => {
    const out = html(
      "Hello **16000 rpm** and `F1600`\n\n1. first\n2. second\n\n```\nG1 X1\n```\n\n> quoted\n\n| a | b |\n|---|---|\n| 1 | 2 |",
    );
    expect(out).toContain("<strong>16000 rpm</strong>");
    expect(out).toContain('<ol class="list-decimal pl-6">');
    expect(out).toContain("<li>first</li>");
    expect(out).toMatch(/<pre[^>]*><code[^>]*>G1 X1\n<\/code><\/pre>/);
    expect(out).toContain("<blockquote");
    expect(out).toContain("<td>2</td>");
  });

  it("keeps message headings below the page's own", () => {
    expect(html("# Title")).toContain('<p class="font-semibold">Title</p>');
  });

  it("shows text past the limits as plain text, nothing dropped", () => {
    const long = `**start** ${"x".repeat(20_001)}`;
    const out = html(long);
    expect(out).toContain("**start**");
    expect(out).toContain("whitespace-pre-wrap");
  });
});
