import "server-only";

import { compileMDX } from "next-mdx-remote/rsc";
import type { ComponentType } from "react";

import type { SheetFrontMatter } from "@/content-schema/sheet-front-matter";

import { remarkSheetGuard } from "./remark-sheet-guard";
import { SheetSourceError, type SheetIssue } from "./sheet-issue";
import { validateSheetSource } from "./validate-sheet-source";

// The components are bound per render by `components/mdx/render-sheet.tsx` (lib never imports components).
type SheetContent = ComponentType<{ components: object }>;

/** A sheet compiled once, renderable in any unit system. */
export type CompiledSheet = { Content: SheetContent; frontMatter: SheetFrontMatter; warnings: SheetIssue[] };

/** Validates, then compiles with JavaScript blocked and the sheet guard as a second check. Throws SheetSourceError. */
export async function compileSheetContent(source: string): Promise<CompiledSheet> {
  const checked = validateSheetSource(source);
  if (!checked.ok) throw new SheetSourceError(checked.issues);
  const guard = {
    mode: "throw" as const,
    lineOffset: checked.bodyLine - 1,
    operationKinds: checked.frontMatter.operations.map((op) => op.kind),
  };
  const { content } = await compileMDX({
    source: checked.body,
    // No components here: they are bound per render, so one compile serves every unit system.
    components: {},
    options: { blockJS: true, blockDangerousJS: true, parseFrontmatter: false, mdxOptions: { remarkPlugins: [[remarkSheetGuard, guard]] } },
  });
  if (typeof content.type !== "function") throw new Error("compileMDX returned no MDX content component");
  return { Content: content.type as SheetContent, frontMatter: checked.frontMatter, warnings: checked.issues };
}
