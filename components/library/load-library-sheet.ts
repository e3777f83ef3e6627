import "server-only";

import { cache } from "react";

import { safeDecode } from "@/lib/http/safe-decode";
import { getLibrarySheet } from "@/lib/sheets/get-library-sheet";
import { getVendorBySlug } from "@/lib/vendors/get-vendor";

/** One lookup per request, shared by a segment's layout (404 check) and its page. */
export const loadLibrarySheet = cache(async (vendorSlug: string, sheetSlug: string, number?: number) => {
  const vendor = await getVendorBySlug(vendorSlug);
  const slug = safeDecode(sheetSlug);
  if (!vendor || slug === null) return null;
  const data = await getLibrarySheet({ vendorId: vendor.id, slug, number });
  return data ? { vendor, data } : null;
});

export const parseVersionNumber = (text: string) => (/^\d{1,6}$/.test(text) ? Number(text) : null);
