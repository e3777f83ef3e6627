import "server-only";

import { cache } from "react";

import { getDraftingSheet } from "@/lib/sheets/get-drafting-sheet";
import { getVendorBySlug } from "@/lib/vendors/get-vendor";

export const loadDraftingSheet = cache(async (vendorSlug: string, slug: string) => {
  const vendor = await getVendorBySlug(vendorSlug);
  return vendor ? getDraftingSheet({ vendorId: vendor.id, slug: decodeURIComponent(slug) }) : null;
});
