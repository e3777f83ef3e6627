import "server-only";

import { cacheLife, cacheTag } from "next/cache";

import { libraryCacheDb, librarySheetTag, libraryTag } from "@/lib/library/library-cache";
import { findLibrarySheet } from "@/lib/sheets/find-library-sheet";

/**
 * A Library sheet's readable data from Next's cache. A published version never changes; publishing,
 * withdrawing and catalogue or branding edits drop the entry by tag (lib/library/library-cache.ts) in the
 * process that made the change. `_generation` (lib/library/library-generation.ts) is only part of the key: other
 * app instances read the bumped number and so miss the old entry as soon as the change commits.
 */
export async function getCachedLibrarySheet(vendorId: string, slug: string, number: number | undefined, _generation: string) {
  "use cache";
  cacheLife("minutes");
  cacheTag(libraryTag(vendorId));
  const data = await findLibrarySheet({ vendorId, slug, number, from: libraryCacheDb });
  if (data) cacheTag(librarySheetTag(data.sheet.id));
  return data;
}
