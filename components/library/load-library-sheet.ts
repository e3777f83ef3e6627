import "server-only";

import { cache } from "react";

import { getVendorBySlug } from "@/lib/vendors/get-vendor";

import { getCachedLibrarySheet } from "./cached-library-sheet";

/** One lookup per request, shared by a segment's layout (404 check) and its page; the vendor (and its access settings) fresh, the sheet from the cache. */
export const loadLibrarySheet = cache(async (vendorSlug: string, sheetSlug: string, number?: number) => {
  const vendor = await getVendorBySlug(vendorSlug);
  if (!vendor) return null;
  const data = await getCachedLibrarySheet(vendor.id, decodeURIComponent(sheetSlug), number);
  return data ? { vendor, data } : null;
});

export const parseVersionNumber = (text: string) => (/^\d{1,6}$/.test(text) ? Number(text) : null);
