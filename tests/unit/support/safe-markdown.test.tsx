import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";

import { parseBlocks, parseInline, safeHref } from "@/components/support/markdown-blocks";
import { SafeMarkdown } from "@/components/support/safe-markdown";

const html = (source: string) => renderToStaticMarkup(<SafeMarkdown source={source} />);

describe("SafeMarkdown", () => {
  it("never turns user text into markup", () => {
    const out = html('<script>alert(1)</script> <img src=x onerror="alert(2)">');
    expect(out).not.toContain("<script");
    expect(out).not.toContain("<img");
    expect(out).toContain("&lt;script&gt;");
  });

  it("links http(s) only; javascript: stays text", () => {
    expect(safeHref("javascript:alert(1)")).toBeNull();
    expect(safeHref("data:text/html,x")).toBeNull();
    const out = html("[sheet](https://example.com/a) and [bad](javascript:alert(1))");
    expect(out).toContain('href="https://example.com/a"');
    expect(out).not.toContain("javascript:alert(1)\"");
    expect(out).toContain("[bad](javascript:alert(1))");
  });

  it("renders paragraphs, lists, code and bold", () => {
    expect(parseBlocks("Hello\n\n- a\n- b\n\n```\nG1 X1\n```").map((b) => b.type)).toEqual(["paragraph", "list", "code"]);
    expect(parseInline("set **16000 rpm** and `F1600`")).toEqual([
      { type: "text", text: "set " },
      { type: "strong", text: "16000 rpm" },
      { type: "text", text: " and " },
      { type: "code", text: "F1600" },
    ]);
    expect(html("1. first\n2. second")).toBe('<div class="space-y-2 text-[0.95rem] leading-relaxed"><ol class="list-decimal pl-6"><li>first</li><li>second</li></ol></div>');
  });
});
