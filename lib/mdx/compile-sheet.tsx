import "server-only";

import { compileMDX } from "next-mdx-remote/rsc";
import { createElement, type ComponentType, type ReactElement } from "react";

import { createMdxComponents, type MdxComponentMap, type SheetRenderContext } from "@/components/mdx";
import type { SheetFrontMatter } from "@/content-schema/sheet-front-matter";

import { remarkSheetGuard } from "./remark-sheet-guard";
import { SheetSourceError, type SheetIssue } from "./sheet-issue";
import { validateSheetSource } from "./validate-sheet-source";

type SheetContent = ComponentType<{ components: MdxComponentMap }>;

/** A sheet compiled once, renderable in any unit system. */
export type CompiledSheet = { Content: SheetContent; frontMatter: SheetFrontMatter; warnings: SheetIssue[] };

/** What a render caller supplies; the front matter comes from the compiled sheet. */
export type SheetRenderOptions = Omit<SheetRenderContext, "frontMatter">;

/** Validates, then compiles with JavaScript blocked and the sheet guard as a second check. Throws SheetSourceError. */
export async function compileSheetContent(source: string): Promise<CompiledSheet> {
  const checked = validateSheetSource(source);
  if (!checked.ok) throw new SheetSourceError(checked.issues);
  const guard = { mode: "throw" as const, lineOffset: checked.bodyLine - 1, operationKinds: checked.frontMatter.operations.map((op) => op.kind) };
  const { content } = await compileMDX({
    source: checked.body,
    // No components here: they are bound per render, so one compile serves every unit system.
    components: {},
    options: { blockJS: true, blockDangerousJS: true, parseFrontmatter: false, mdxOptions: { remarkPlugins: [[remarkSheetGuard, guard]] } },
  });
  if (typeof content.type !== "function") throw new Error("compileMDX returned no MDX content component");
  return { Content: content.type as SheetContent, frontMatter: checked.frontMatter, warnings: checked.issues };
}

/** Renders a compiled sheet with only the allowed components, bound to the caller's context. */
export function renderCompiledSheet(compiled: CompiledSheet, options: SheetRenderOptions): ReactElement {
  const components = createMdxComponents({ ...options, frontMatter: compiled.frontMatter });
  return createElement(compiled.Content, { components });
}

/** Compiles and renders one sheet source (uncached: drafts and previews). */
export async function compileSheet(options: SheetRenderOptions & { source: string }): Promise<{ content: ReactElement; frontMatter: SheetFrontMatter }> {
  const { source, ...render } = options;
  const compiled = await compileSheetContent(source);
  return { content: renderCompiledSheet(compiled, render), frontMatter: compiled.frontMatter };
}
