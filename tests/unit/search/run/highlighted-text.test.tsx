import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";

import { HighlightedText } from "@/components/search/highlighted-text";
import { highlightRanges } from "@/search/run/highlight";

describe("HighlightedText", () => {
  it("marks the ranges and escapes the text around them", () => {
    const text = '<img src=x onerror="alert(1)"> cast acrylic';
    const html = renderToStaticMarkup(<HighlightedText text={text} ranges={highlightRanges(text, ["acrylic"])} />);
    expect(html).toContain('<mark class="rounded-sm bg-amber-100 px-0.5 text-inherit">acrylic</mark>');
    expect(html).not.toContain("<img");
    expect(html).toContain("&lt;img src=x onerror=&quot;alert(1)&quot;&gt;");
  });

  it("skips ranges that overlap or run past the text instead of garbling it", () => {
    const html = renderToStaticMarkup(
      <HighlightedText
        text="abcdef"
        ranges={[
          [0, 2],
          [1, 3],
          [4, 99],
        ]}
      />,
    );
    expect(html).toBe('<mark class="rounded-sm bg-amber-100 px-0.5 text-inherit">ab</mark><span>cdef</span>');
  });
});
