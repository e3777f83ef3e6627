import { compile } from "@mdx-js/mdx";
import { compileMDX } from "next-mdx-remote/rsc";
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";

import { compileSheet } from "@/components/mdx/render-sheet";
import { remarkSheetGuard } from "@/lib/mdx/remark-sheet-guard";
import { SheetSourceError } from "@/lib/mdx/sheet-issue";
import { buildSheetSource, lineOf } from "@/tests/factories/sheet-source";

const SCRIPT_OR_HANDLER = /<script|<iframe|\son[a-z]+=|javascript:/i;

async function render(source: string, units: "metric" | "imperial" = "metric") {
  const { content, frontMatter } = await compileSheet({ source, units, cutter: { flutes: 1, diameterMm: 3.175 } });
  return { html: renderToStaticMarkup(content), frontMatter };
}

describe("compileSheet renders a valid sheet with the allowed components", () => {
  it("renders prose, caution, operation table, adapt slot and figure", async () => {
    const { html, frontMatter } = await render(buildSheetSource());
    expect(frontMatter.operations).toHaveLength(2);
    expect(html).toContain("<h2>Before you cut</h2>");
    expect(html).toMatch(/<aside role="note"[^>]*data-caution="melting"/);
    expect(html).toContain(">Melting</span>");
    expect(html).toMatch(/<table[^>]*data-units="metric"/);
    expect(html).toContain('<section id="adapt" data-operation="0"');
    expect(html).toContain('alt="A clean slot in clear acrylic"');
    expect(html).not.toMatch(SCRIPT_OR_HANDLER);
  });

  it("shows the numbers in the reader's unit system", async () => {
    const metric = (await render(buildSheetSource(), "metric")).html;
    const imperial = (await render(buildSheetSource(), "imperial")).html;
    expect(metric).toContain("1800\u00a0mm/min");
    // 1800 mm/min ÷ 25.4 mm/in = 70.87 in/min (NIST SP 811: 1 in = 25.4 mm).
    expect(imperial).toContain("70.9\u00a0in/min");
  });

  it("renders hostile-looking text inside allowed places as inert text", async () => {
    const body = '<Caution kind="general" title="<script>alert(1)</script>">Type &lt;img onerror=x&gt; literally.</Caution>\n';
    const { html } = await render(buildSheetSource({ body }));
    expect(html).toContain("&lt;script&gt;alert(1)&lt;/script&gt;");
    expect(html).not.toMatch(/<script|<img/i);
  });

  it("hands the adapt slot to the page's panel when one is given", async () => {
    const { content } = await compileSheet({
      source: buildSheetSource(),
      units: "metric",
      renderAdaptPanel: ({ index, operation }) => createElement("output", null, `panel ${index} ${operation.kind}`),
    });
    expect(renderToStaticMarkup(content)).toMatch(/<section id="adapt"[^>]*>.*<output>panel 0 slotting<\/output><\/section>/);
  });
});

describe("compileSheet refuses hostile sources before compiling", () => {
  it.each([
    'import x from "y"',
    "export const a = 1",
    "{process.env.SECRET}",
    "Inline {1+1} maths.",
    "<script>alert(1)</script>",
    '<iframe src="https://evil.example.com/"></iframe>',
    '<img src="x.png" onerror="alert(1)" />',
    '<Caution kind="fire" onClick="alert(1)">Hot.</Caution>',
    "[x](javascript:alert(1))",
    "<Unknown />",
    '<Figure src={x} alt="A slot" />',
  ])("%s", async (snippet) => {
    const source = buildSheetSource({ body: `Prose.\n\n${snippet}\n` });
    const error = await compileSheet({ source, units: "metric" }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(SheetSourceError);
    expect((error as SheetSourceError).issues.map((i) => i.line)).toContain(lineOf(source, snippet));
  });
});

describe("the sheet guard as a second line of defence inside the compiler", () => {
  it("fails an @mdx-js/mdx compile and names the file line", async () => {
    const compiling = compile("Text\n\n<script>alert(1)</script>\n", { remarkPlugins: [[remarkSheetGuard, { lineOffset: 10 }]] });
    await expect(compiling).rejects.toThrow(/line 13:1: HTML element <script>/);
  });

  it("runs before next-mdx-remote silently drops attribute expressions and imports", async () => {
    const options = { mdxOptions: { remarkPlugins: [remarkSheetGuard] } };
    await expect(compileMDX({ source: '<Figure src={x} alt="a" />', options })).rejects.toThrow(/Attribute expression src/);
    await expect(compileMDX({ source: 'import x from "y"\n\nText', options })).rejects.toThrow(/`import`/);
  });
});
