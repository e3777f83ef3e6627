import "server-only";

import { cache } from "react";

import { requirePageAccess } from "@/lib/auth/page-access";
import { safeDecode } from "@/lib/http/safe-decode";
import { libraryCacheDb } from "@/lib/library/library-cache";
import { readLibraryGeneration } from "@/lib/library/library-generation";

import { getCachedLibraryCutter } from "./cached-library-cutter";

export const findLibraryCutterPage = cache(async (vendorSlug: string, sku: string) => {
  // The access check runs here, so the page checks it as well as the layout (a page segment can render alone).
  const { vendor, user, member } = await requirePageAccess(vendorSlug, "library.read", `/${vendorSlug}/library/cutters/${sku}`);
  const decoded = safeDecode(sku);
  if (decoded === null) return null;
  const generation = await readLibraryGeneration(vendor.id, libraryCacheDb);
  const cutter = await getCachedLibraryCutter(vendor.id, decoded, generation);
  return cutter ? { vendor, cutter, user, member, generation } : null;
});
