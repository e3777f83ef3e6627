import "server-only";

import { cacheLife, cacheTag } from "next/cache";

import { findVersionAdaptContext } from "@/lib/adapt/find-version-adapt-context";
import { libraryTag } from "@/lib/library/library-cache";

/**
 * A readable version's adapt inputs from Next's cache, for Library pages: they change only with the version's
 * state or the catalogue, and both drop the vendor's Library tag (lib/library/library-cache.ts) in the process that
 * made the change; `_generation` (lib/library/library-generation.ts) is only part of the key, so other app
 * instances miss the old entry as soon as the change commits.
 */
export async function getCachedAdaptContext(vendorId: string, versionId: string, _generation: string) {
  "use cache";
  cacheLife("minutes");
  cacheTag(libraryTag(vendorId));
  return findVersionAdaptContext({ vendorId, versionId });
}
