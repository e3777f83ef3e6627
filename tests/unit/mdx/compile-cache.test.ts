import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it, vi } from "vitest";

import { getCompiledSheet } from "@/components/mdx/render-sheet";
import { createCompiledSheetCache, sourceHash } from "@/lib/mdx/compile-cache";
import { compileSheetContent } from "@/lib/mdx/compile-sheet";
import { buildSheetSource } from "@/tests/factories/sheet-source";

function countingCache(maxEntries = 10) {
  const compile = vi.fn(compileSheetContent);
  return { compile, cache: createCompiledSheetCache({ maxEntries, compile }) };
}

describe("compiled sheet cache", () => {
  it("keys by sha256 of the source", () => {
    // sha256("abc") from FIPS 180-2, appendix B.1.
    expect(sourceHash("abc")).toBe("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
  });

  it("compiles a version once, also for concurrent requests", async () => {
    const { compile, cache } = countingCache();
    const source = buildSheetSource();
    const [a, b] = await Promise.all([cache.getCompiled("v1", source), cache.getCompiled("v1", source)]);
    await cache.getCompiled("v1", source);
    expect(compile).toHaveBeenCalledTimes(1);
    expect(a).toBe(b);
  });

  it("compiles again when the version or its content differs", async () => {
    const { compile, cache } = countingCache();
    const source = buildSheetSource();
    await cache.getCompiled("v1", source);
    await cache.getCompiled("v2", source);
    await cache.getCompiled("v1", buildSheetSource({ body: "Changed.\n" }));
    expect(compile).toHaveBeenCalledTimes(3);
  });

  it("stays bounded, dropping the least recently used version", async () => {
    const { compile, cache } = countingCache(2);
    const source = buildSheetSource();
    await cache.getCompiled("a", source);
    await cache.getCompiled("b", source);
    await cache.getCompiled("a", source); // a is now the most recent
    await cache.getCompiled("c", source); // evicts b
    expect(cache.size).toBe(2);
    await cache.getCompiled("a", source);
    expect(compile).toHaveBeenCalledTimes(3);
    await cache.getCompiled("b", source);
    expect(compile).toHaveBeenCalledTimes(4);
  });

  it("does not keep a failed compile", async () => {
    const { compile, cache } = countingCache();
    const bad = buildSheetSource({ body: "<script>x</script>\n" });
    await expect(cache.getCompiled("v1", bad)).rejects.toThrow(/script/);
    await expect(cache.getCompiled("v1", bad)).rejects.toThrow(/script/);
    expect(compile).toHaveBeenCalledTimes(2);
    expect(cache.size).toBe(0);
  });

  it("renders one cached compile in either unit system", async () => {
    const source = buildSheetSource();
    const metric = await getCompiledSheet({ versionId: "cache-units", source, units: "metric" });
    const imperial = await getCompiledSheet({ versionId: "cache-units", source, units: "imperial" });
    expect(renderToStaticMarkup(metric.content)).toContain('data-units="metric"');
    expect(renderToStaticMarkup(imperial.content)).toContain('data-units="imperial"');
    expect(imperial.frontMatter).toBe(metric.frontMatter);
  });
});
