import "server-only";

import { createHash } from "node:crypto";

import type { ReactElement } from "react";

import type { SheetFrontMatter } from "@/content-schema/sheet-front-matter";

import { compileSheetContent, renderCompiledSheet, type CompiledSheet, type SheetRenderOptions } from "./compile-sheet";
import { LruCache } from "./lru-cache";

export const sourceHash = (source: string) => createHash("sha256").update(source, "utf8").digest("hex");

type Compile = (source: string) => Promise<CompiledSheet>;

/** A per-process cache of compiled sheets; the promise is stored so concurrent requests compile once. */
export function createCompiledSheetCache({ maxEntries = 200, compile = compileSheetContent }: { maxEntries?: number; compile?: Compile } = {}) {
  const cache = new LruCache<string, Promise<CompiledSheet>>(maxEntries);

  async function getCompiled(versionId: string, source: string): Promise<CompiledSheet> {
    const key = `${versionId}:${sourceHash(source)}`;
    const hit = cache.get(key);
    if (hit) return hit;
    const pending = compile(source);
    cache.set(key, pending);
    // A failed compile is not kept, so a fixed source (or a passing retry) compiles again.
    pending.catch(() => cache.delete(key));
    return pending;
  }

  return {
    getCompiled,
    get size() {
      return cache.size;
    },
    clear: () => cache.clear(),
  };
}

const defaultCache = createCompiledSheetCache();

/** A published version's rendered content, compiled once per server process. */
export async function getCompiledSheet(
  options: SheetRenderOptions & { versionId: string; source: string },
): Promise<{ content: ReactElement; frontMatter: SheetFrontMatter }> {
  const { versionId, source, ...render } = options;
  const compiled = await defaultCache.getCompiled(versionId, source);
  return { content: renderCompiledSheet(compiled, render), frontMatter: compiled.frontMatter };
}

export const clearCompiledSheetCache = () => defaultCache.clear();
