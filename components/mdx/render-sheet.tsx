import "server-only";

import { createElement, type ReactElement } from "react";

import type { SheetFrontMatter } from "@/content-schema/sheet-front-matter";
import { getCachedCompiledSheet } from "@/lib/mdx/compile-cache";
import { compileSheetContent, type CompiledSheet } from "@/lib/mdx/compile-sheet";

import { createMdxComponents } from "./create-mdx-components";
import type { SheetRenderContext } from "./sheet-render-context";

/** What a render caller supplies; the front matter comes from the compiled sheet. */
export type SheetRenderOptions = Omit<SheetRenderContext, "frontMatter">;
type Rendered = { content: ReactElement; frontMatter: SheetFrontMatter };

/** Renders a compiled sheet with only the allowed components, bound to the caller's context. */
export function renderCompiledSheet(compiled: CompiledSheet, options: SheetRenderOptions): ReactElement {
  const components = createMdxComponents({ ...options, frontMatter: compiled.frontMatter });
  return createElement(compiled.Content, { components });
}

/** Compiles and renders one sheet source (uncached: drafts and previews). */
export async function compileSheet(options: SheetRenderOptions & { source: string }): Promise<Rendered> {
  const { source, ...render } = options;
  const compiled = await compileSheetContent(source);
  return { content: renderCompiledSheet(compiled, render), frontMatter: compiled.frontMatter };
}

/** A published version's rendered content, compiled once per server process. */
export async function getCompiledSheet(options: SheetRenderOptions & { versionId: string; source: string }): Promise<Rendered> {
  const { versionId, source, ...render } = options;
  const compiled = await getCachedCompiledSheet(versionId, source);
  return { content: renderCompiledSheet(compiled, render), frontMatter: compiled.frontMatter };
}
