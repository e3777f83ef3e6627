import { describe, expect, it } from "vitest";

import { splitFrontMatter } from "@/lib/mdx/split-front-matter";

describe("splitFrontMatter", () => {
  it("separates YAML and body and says where each starts", () => {
    const split = splitFrontMatter("---\na: 1\nb: 2\n---\n# Title\n\nText\n");
    expect(split).toEqual({ ok: true, frontMatter: "a: 1\nb: 2", frontMatterLine: 2, body: "# Title\n\nText\n", bodyLine: 5 });
  });

  it("accepts a byte-order mark, CRLF and trailing spaces on the fences", () => {
    const split = splitFrontMatter("\uFEFF---  \r\na: 1\r\n--- \r\nText");
    expect(split).toMatchObject({ ok: true, frontMatter: "a: 1", bodyLine: 4, body: "Text" });
  });

  it("does not take a later --- inside the body as the opening fence", () => {
    expect(splitFrontMatter("Text\n---\na: 1\n---\n")).toMatchObject({ ok: false, line: 1 });
  });
});
