import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";

import { AdaptPanelSlot, Caution, createMdxComponents, Figure, mdxComponentNames } from "@/components/mdx";
import { sheetFrontMatterSchema } from "@/content-schema/sheet-front-matter";
import { frontMatterInput } from "@/tests/factories/sheet-source";

const frontMatter = sheetFrontMatterSchema.parse(frontMatterInput());

describe("MDX components", () => {
  it("the allowlist map has exactly the allowed components", () => {
    expect(Object.keys(createMdxComponents({ frontMatter, units: "metric" })).sort()).toEqual([...mdxComponentNames].sort());
  });

  it("Caution shows an icon and the hazard's word, not colour alone", () => {
    const html = renderToStaticMarkup(createElement(Caution, { kind: "dust", title: "Wear a mask" }, "MDF dust is fine."));
    expect(html).toContain('<svg aria-hidden="true"');
    expect(html).toContain(">Dust</span>");
    expect(html).toContain('aria-label="Dust: Wear a mask"');
  });

  it("Caution falls back to a general caution for a kind it does not know", () => {
    expect(renderToStaticMarkup(createElement(Caution, { kind: "lava" }, "x"))).toContain(">Caution</span>");
  });

  it("Figure resolves relative sources and refuses unsafe ones", () => {
    const resolveSrc = (src: string) => `/media/v1/${src}`;
    expect(renderToStaticMarkup(createElement(Figure, { src: "a.png", alt: "A", resolveSrc }))).toContain('src="/media/v1/a.png"');
    expect(renderToStaticMarkup(createElement(Figure, { src: "https://cdn.example.com/a.png", alt: "A", resolveSrc }))).toContain(
      'src="https://cdn.example.com/a.png"',
    );
    expect(renderToStaticMarkup(createElement(Figure, { src: "javascript:alert(1)//.png", alt: "A" }))).toBe("");
  });

  it("AdaptPanel slot marks the operation and points to the panel", () => {
    const html = renderToStaticMarkup(createElement(AdaptPanelSlot, { operation: "1", context: { frontMatter, units: "metric" } }));
    expect(html).toMatch(/^<section id="adapt" data-operation="1"/);
    expect(html).toContain("Adapt this operation to your machine in the panel on this page");
    expect(html).toContain("Outside profile");
  });
});
