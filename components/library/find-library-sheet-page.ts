import "server-only";

import { cache } from "react";

import { requirePageAccess } from "@/lib/auth/page-access";
import { safeDecode } from "@/lib/http/safe-decode";
import { libraryCacheDb } from "@/lib/library/library-cache";
import { readLibraryGeneration } from "@/lib/library/library-generation";

import { getCachedLibrarySheet } from "./cached-library-sheet";

/** One lookup per request, shared by a segment's layout (404 check) and its page; the vendor (and its access settings) fresh, the sheet from the cache. */
export const findLibrarySheetPage = cache(async (vendorSlug: string, sheetSlug: string, number?: number) => {
  // The access check runs here, so the page checks it as well as the layout (a page segment can render alone).
  const { vendor } = await requirePageAccess(vendorSlug, "library.read", `/${vendorSlug}/library/${sheetSlug}`);
  const slug = safeDecode(sheetSlug);
  if (slug === null) return null;
  const generation = await readLibraryGeneration(vendor.id, libraryCacheDb);
  const data = await getCachedLibrarySheet(vendor.id, slug, number, generation);
  return data ? { vendor, data, generation } : null;
});

export const parseVersionNumber = (text: string) => (/^\d{1,6}$/.test(text) ? Number(text) : null);
