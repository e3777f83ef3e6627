import { describe, expect, it, vi } from "vitest";

const revalidateTag = vi.fn();
vi.mock("next/cache", () => ({ revalidateTag: (...args: unknown[]) => revalidateTag(...args) }));

const { invalidateLibrary, libraryTag, librarySheetTag } = await import("@/lib/library/library-cache");

describe("Library cache invalidation", () => {
  it("expires the vendor's and the sheet's tags at once, never stale-while-revalidate", () => {
    revalidateTag.mockReset();
    invalidateLibrary({ vendorId: "v1", sheetId: "s1" });
    expect(revalidateTag.mock.calls).toEqual([
      [libraryTag("v1"), { expire: 0 }],
      [librarySheetTag("s1"), { expire: 0 }],
    ]);
  });

  it("is a no-op outside a Next.js server (seeds, scripts, tests) but lets any other failure through", () => {
    revalidateTag.mockReset().mockImplementation(() => {
      throw new Error('Invariant: static generation store missing in revalidateTag("library:v1")');
    });
    expect(() => invalidateLibrary({ vendorId: "v1" })).not.toThrow();
    revalidateTag.mockReset().mockImplementation(() => {
      throw new Error("Route /x used revalidateTag during render");
    });
    expect(() => invalidateLibrary({ vendorId: "v1" })).toThrow("during render");
  });
});
