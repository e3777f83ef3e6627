import "server-only";

import { createHash } from "node:crypto";

import { compileSheetContent, type CompiledSheet } from "./compile-sheet";
import { LruCache } from "./lru-cache";

export const sourceHash = (source: string) => createHash("sha256").update(source, "utf8").digest("hex");

type Compile = (source: string) => Promise<CompiledSheet>;

/** A per-process cache of compiled sheets; the promise is stored so concurrent requests compile once. */
export function createCompiledSheetCache({
  maxEntries = 200,
  compile = compileSheetContent,
}: { maxEntries?: number; compile?: Compile } = {}) {
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

/** A published version compiled once per server process (rendered by `components/mdx/render-sheet.tsx`). */
export const getCachedCompiledSheet = (versionId: string, source: string): Promise<CompiledSheet> =>
  defaultCache.getCompiled(versionId, source);

export const clearCompiledSheetCache = () => defaultCache.clear();
