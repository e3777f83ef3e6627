import "server-only";

import { cacheLife, cacheTag } from "next/cache";

import { findVersionAdaptContext } from "@/lib/adapt/find-version-adapt-context";
import { libraryTag } from "@/lib/library/library-cache";

/**
 * A readable version's adapt inputs from Next's cache, for Library pages: they change only with the version's
 * state or the catalogue, and both drop the vendor's Library tag (lib/library/library-cache.ts).
 */
export async function getCachedAdaptContext(vendorId: string, versionId: string) {
  "use cache";
  cacheLife("minutes");
  cacheTag(libraryTag(vendorId));
  return findVersionAdaptContext({ vendorId, versionId });
}
