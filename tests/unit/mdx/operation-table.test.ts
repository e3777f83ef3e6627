import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";

import { OperationTable, type SheetRenderContext } from "@/components/mdx";
import { sheetFrontMatterSchema } from "@/content-schema/sheet-front-matter";
import { frontMatterInput, operationInput } from "@/tests/factories/sheet-source";

const NBSP = "\u00a0";

function table(context: Partial<SheetRenderContext> = {}, only?: string) {
  const frontMatter = sheetFrontMatterSchema.parse(
    frontMatterInput({
      operations: [
        operationInput({ n: "18000 rpm", vf: "1800 mm/min", ap: "1.5 mm", ae: "40 %", plungeFeed: "500 mm/min" }),
        operationInput({ kind: "profile", label: undefined, ae: "0.5 mm", entry: "none", rampAngleDeg: undefined, plungeFeed: undefined }),
      ],
    }),
  );
  return renderToStaticMarkup(createElement(OperationTable, { only, context: { frontMatter, units: "metric", ...context } }));
}

const cells = (html: string) => [...html.matchAll(/<td class="([^"]*)"[^>]*>([^<]*)<\/td>/g)].map((m) => ({ cls: m[1], text: m[2] }));

describe("OperationTable", () => {
  it("derives fz = vf / (z·n) when the cutter's flutes are known", () => {
    // 1800 mm/min / (2 · 18000 rpm) = 0.05 mm per tooth (vf = fz·z·n, Machinery's Handbook).
    const html = table({ cutter: { flutes: 2 } });
    expect(html).toContain(">fz</th>");
    expect(html).toMatch(new RegExp(`>0\\.0500${NBSP}mm/tooth<`));
  });

  it("leaves fz out when the flutes are unknown", () => {
    expect(table()).not.toContain(">fz</th>");
  });

  it("converts to imperial: 1.5 mm is 0.0591 in, 1800 mm/min is 70.9 in/min", () => {
    // 1.5 / 25.4 = 0.05906 in; 1800 / 25.4 = 70.87 in/min (1 in = 25.4 mm, NIST SP 811).
    const html = table({ units: "imperial" });
    expect(html).toContain(`>0.0591${NBSP}in<`);
    expect(html).toContain(`>70.9${NBSP}in/min<`);
    expect(html).toContain('data-units="imperial"');
  });

  it("shows ae as a share of D, and in mm when the diameter is known", () => {
    expect(table()).toContain(`>40${NBSP}% of D<`);
    // 40 % of 6.35 mm = 2.54 mm.
    expect(table({ cutter: { diameterMm: 6.35 } })).toContain(`>40${NBSP}% of D (2.54${NBSP}mm)<`);
  });

  it("sets every number in tabular figures with its unit", () => {
    const numeric = cells(table({ cutter: { flutes: 2 } })).filter((c) => /\d/.test(c.text));
    expect(numeric.length).toBeGreaterThan(8);
    for (const cell of numeric) {
      expect(cell.cls).toContain("font-mono tabular-nums");
      expect(cell.text).toMatch(/\d\u00a0(rpm|mm\/min|mm\/tooth|mm|% of D)/);
    }
  });

  it("sets the ramp angle in tabular figures beside the entry method", () => {
    expect(table()).toContain('Ramp<span class="font-mono tabular-nums">, 3°</span>');
  });

  it("filters rows with only=", () => {
    const html = table({}, "profile");
    expect(html).toContain('data-operation="1"');
    expect(html).not.toContain('data-operation="0"');
    expect(html).toContain("Profile (contour)");
  });

  it("renders nothing when no operation matches", () => {
    expect(table({}, "drilling")).toBe("");
  });
});
