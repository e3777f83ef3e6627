import "server-only";

import { cache } from "react";

import { safeDecode } from "@/lib/http/safe-decode";
import { getDraftingSheet } from "@/lib/sheets/get-drafting-sheet";
import { getVendorBySlug } from "@/lib/vendors/get-vendor";

export const findDraftingSheetPage = cache(async (vendorSlug: string, slug: string) => {
  const vendor = await getVendorBySlug(vendorSlug);
  const decoded = safeDecode(slug);
  return vendor && decoded !== null ? getDraftingSheet({ vendorId: vendor.id, slug: decoded }) : null;
});
