import { describe, expect, it } from "vitest";

import {
  adaptPanelPropsSchema,
  cautionPropsSchema,
  figurePropsSchema,
  isMdxComponentName,
  mdxComponentNames,
  operationTablePropsSchema,
} from "@/content-schema/mdx-components";

describe("MDX component prop schemas", () => {
  it("lists exactly the allowed components", () => {
    expect([...mdxComponentNames].sort()).toEqual(["AdaptPanel", "Caution", "Figure", "OperationTable"]);
    expect(isMdxComponentName("script")).toBe(false);
    expect(isMdxComponentName("constructor")).toBe(false);
  });

  it("Caution needs a known kind and takes no other attributes", () => {
    expect(cautionPropsSchema.parse({ kind: "dust", title: "Wear a mask" })).toEqual({ kind: "dust", title: "Wear a mask" });
    expect(cautionPropsSchema.safeParse({ kind: "lava" }).success).toBe(false);
    expect(cautionPropsSchema.safeParse({ kind: "dust", onClick: "x" }).success).toBe(false);
  });

  it("OperationTable only= is a comma list of operation kinds", () => {
    expect(operationTablePropsSchema.parse({ only: "slotting, profile" }).only).toEqual(["slotting", "profile"]);
    expect(operationTablePropsSchema.safeParse({ only: "slotting,boring" }).success).toBe(false);
    expect(operationTablePropsSchema.safeParse({ only: " , " }).success).toBe(false);
  });

  it("AdaptPanel operation= is an index counting from 0", () => {
    expect(adaptPanelPropsSchema.parse({ operation: "2" }).operation).toBe(2);
    expect(adaptPanelPropsSchema.parse({}).operation).toBe(0);
    expect(adaptPanelPropsSchema.safeParse({ operation: "-1" }).success).toBe(false);
    expect(adaptPanelPropsSchema.safeParse({ operation: "first" }).success).toBe(false);
  });

  it.each(["images/slot.png", "./a/b.JPG", "https://cdn.example.com/x/slot.webp", "slot.svg?v=2"])("Figure accepts src %s", (src) => {
    expect(figurePropsSchema.safeParse({ src, alt: "A slot" }).success).toBe(true);
  });

  it.each([
    "javascript:alert(1)",
    "data:image/png;base64,AAAA",
    "http://example.com/a.png",
    "//evil.example.com/a.png",
    "../secrets/a.png",
    "https://example.com/page.html",
    "images/slot.png onerror=x",
  ])("Figure refuses src %s", (src) => {
    expect(figurePropsSchema.safeParse({ src, alt: "A slot" }).success).toBe(false);
  });

  it("Figure requires alt text", () => {
    expect(figurePropsSchema.safeParse({ src: "a.png" }).success).toBe(false);
    expect(figurePropsSchema.safeParse({ src: "a.png", alt: "  " }).success).toBe(false);
  });
});
