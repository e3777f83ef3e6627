import "server-only";

import { cacheLife, cacheTag } from "next/cache";

import { libraryCacheDb, libraryTag } from "@/lib/library/library-cache";

import { LibraryIndex, type LibraryIndexProps } from "./library-index";

/**
 * The Library index below its header from Next's cache, per filter and unit system: publishing, withdrawing and
 * catalogue edits drop the vendor's Library tag (lib/library/library-cache.ts). Access is checked by the page; a
 * reader's own "Fits my shop" list is never cached (the page renders LibraryIndex for it). The vendor's Library
 * generation (lib/library/library-generation.ts) is part of the key, so other app instances miss the old entry as
 * soon as a change commits.
 */
export async function CachedLibraryIndex({ generation: _generation, ...props }: Omit<LibraryIndexProps, "from"> & { generation: string }) {
  "use cache";
  cacheLife("minutes");
  cacheTag(libraryTag(props.vendorId));
  return <LibraryIndex {...props} from={libraryCacheDb} />;
}
