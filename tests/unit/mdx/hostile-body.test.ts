import { describe, expect, it } from "vitest";

import { validateSheetSource } from "@/lib/mdx/validate-sheet-source";
import { buildSheetSource, lineOf } from "@/tests/factories/sheet-source";

/** A valid sheet with `snippet` between two paragraphs of prose. */
function withSnippet(snippet: string): string {
  return buildSheetSource({ body: `## Notes\n\nPlain prose before.\n\n${snippet}\n\nPlain prose after.\n` });
}

function errorsOf(source: string) {
  const result = validateSheetSource(source);
  expect(result.ok).toBe(false);
  return result.issues.filter((issue) => issue.severity === "error");
}

describe("hostile MDX is rejected with the line it is on", () => {
  it.each([
    ['import x from "y"', /`import`/],
    ["export const a = 1", /`export`/],
    ["{process.env.SECRET}", /expressions/],
    ["Two is {1+1} here.", /expressions/],
    ["{/* a comment is an expression too */}", /expressions/],
    ["<script>alert(1)</script>", /<script>/],
    ['<iframe src="https://evil.example.com/"></iframe>', /<iframe>/],
    ['<style>{"body { display: none }"}</style>', /<style>/],
    ['<object data="movie.swf" />', /<object>/],
    ['<embed src="movie.swf" />', /<embed>/],
    ['<form action="https://evil.example.com/"><button>Go</button></form>', /<form>/],
    ['<img src="x.png" onerror="alert(1)" />', /onerror/],
    ['<a href="javascript:alert(1)">x</a>', /`javascript:`/],
    ["Some <span>inline</span> markup.", /<span>/],
    ['<Caution kind="fire" onClick="alert(1)">Hot chips.</Caution>', /onClick/],
    ["[x](javascript:alert(1))", /`javascript:`/],
    ["[x](JaVaScRiPt:alert(1))", /`javascript:`/],
    ["[x](java&#115;cript:alert(1))", /`javascript:`/],
    ["[x](vbscript:msgbox(1))", /`vbscript:`/],
    ["![x](data:image/svg+xml;base64,PHN2Zz4=)", /`data:`/],
    ["![x](http://insecure.example.com/a.png)", /`http:` URLs are not allowed in images/],
    ["<Unknown />", /Unknown component <Unknown>/],
    ["<Widgets.Panel />", /<Widgets.Panel>/],
    ["<>fragment</>", /Fragments/],
    ['<Figure src={x} alt="A slot" />', /Attribute expression src=\{…\}/],
    ['<Figure {...props} alt="A slot" />', /Spread attributes/],
    ['<Caution kind="fire" title="Hot" href="javascript:alert(1)">x</Caution>', /`javascript:`/],
    ['<Caution kind="lava">Hot.</Caution>', /<Caution> kind/],
    ['<Figure src="a.png" alt="A slot">a caption as content</Figure>', /takes no content/],
    ['<AdaptPanel operation="9" />', /points past the 2 operation/],
  ])("%s", (snippet, message) => {
    const source = withSnippet(snippet);
    const errors = errorsOf(source);
    const line = lineOf(source, snippet);
    expect(
      errors.some((e) => e.line === line && message.test(e.message)),
      JSON.stringify(errors),
    ).toBe(true);
  });

  it("reports a link definition with a javascript: URL on the definition's line", () => {
    const source = withSnippet("[click][evil]\n\n[evil]: javascript:alert(1)");
    expect(errorsOf(source)).toEqual([
      expect.objectContaining({ line: lineOf(source, "[evil]:"), message: expect.stringMatching(/javascript/) }),
    ]);
  });

  it.each(["<iframe src=https://evil.example.com/ ></iframe>", "<img onerror=alert(1)>", "<script>"])(
    "reports unparseable markup %s as an MDX syntax error on its line",
    (snippet) => {
      const source = withSnippet(snippet);
      const [error] = errorsOf(source);
      expect(error.message).toMatch(/^MDX syntax/);
      expect(error.line).toBe(lineOf(source, snippet));
    },
  );

  it("allows one adapt panel only", () => {
    const source = withSnippet('<AdaptPanel operation="0" />\n\n<AdaptPanel operation="1" />');
    expect(errorsOf(source)).toEqual([expect.objectContaining({ line: lineOf(source, '<AdaptPanel operation="1" />') })]);
  });

  it("reports every problem, not only the first", () => {
    const source = withSnippet('import x from "y"\n\n<script>alert(1)</script>\n\n[x](javascript:alert(1))');
    expect(errorsOf(source).map((e) => e.line)).toEqual([lineOf(source, "import x"), lineOf(source, "<script>"), lineOf(source, "[x](")]);
  });
});

describe("safe MDX passes", () => {
  it("accepts the factory's sheet with every allowed component", () => {
    const result = validateSheetSource(buildSheetSource());
    expect(result.issues).toEqual([]);
    expect(result.ok).toBe(true);
  });

  it("does not mistake prose with a colon for a URL scheme", () => {
    const result = validateSheetSource(
      withSnippet('<Caution kind="general" title="Data: keep the guard on">Note: javascript is not involved.</Caution>'),
    );
    expect(result.ok).toBe(true);
  });

  it("accepts http, https, mailto and relative links", () => {
    const result = validateSheetSource(
      withSnippet("[a](https://a.example) [b](http://b.example) [c](mailto:lab@example.com) [d](../other-sheet) [e](#adapt)"),
    );
    expect(result.ok).toBe(true);
  });

  it("warns, without failing, when OperationTable lists a kind no operation has", () => {
    const source = withSnippet('<OperationTable only="drilling" />');
    const result = validateSheetSource(source);
    expect(result.ok).toBe(true);
    expect(result.issues).toEqual([expect.objectContaining({ severity: "warning", line: lineOf(source, "<OperationTable") })]);
  });
});
