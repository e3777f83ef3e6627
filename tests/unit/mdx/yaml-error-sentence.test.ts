import { describe, expect, it } from "vitest";

import { checkFrontMatter } from "@/lib/mdx/front-matter-issues";

// Front matter that starts on line 2 of the file (after the opening ---).
const issuesOf = (yaml: string) => checkFrontMatter(yaml, 2).issues;

describe("YAML errors read as sentences with their line", () => {
  it.each([
    ["title: x\ntitle: y\n", 3, "This field is already given above; keep only one of the two."],
    [
      "title: x\nsummary y\nother: z\n",
      3,
      "A line here is not a field: write the field name, a colon and a space, then the value (like “vf: 1800 mm/min”).",
    ],
    ['title: "unclosed\nsummary: y\n', 4, "A quoted value is not closed; end it with the same quote mark on this line."],
    ["title: @foo\n", 2, "A value cannot start with “@”; put the whole value in quotes."],
    ["tags: [a, b\nx: 1\n", 3, "A list in brackets is not closed; end it with “]” on the same line."],
  ])("%j", (yaml, line, sentence) => {
    const [first] = issuesOf(yaml);
    expect(first).toMatchObject({ line, message: sentence, severity: "error" });
    expect(first.message).not.toMatch(/YAML:|at line|implicit/i);
  });
});
