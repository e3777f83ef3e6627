import "server-only";

import { cache } from "react";

import { safeDecode } from "@/lib/http/safe-decode";
import { findDraftingSheet } from "@/lib/sheets/find-drafting-sheet";
import { findVendorBySlug } from "@/lib/vendors/get-vendor";

export const findDraftingSheetPage = cache(async (vendorSlug: string, slug: string) => {
  const vendor = await findVendorBySlug(vendorSlug);
  const decoded = safeDecode(slug);
  return vendor && decoded !== null ? findDraftingSheet({ vendorId: vendor.id, slug: decoded }) : null;
});
