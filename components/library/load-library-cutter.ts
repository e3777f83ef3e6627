import "server-only";

import { cache } from "react";

import { getCutterBySku } from "@/lib/catalogue/get-catalogue-item";
import { getVendorBySlug } from "@/lib/vendors/get-vendor";

export const loadLibraryCutter = cache(async (vendorSlug: string, sku: string) => {
  const vendor = await getVendorBySlug(vendorSlug);
  if (!vendor) return null;
  const cutter = await getCutterBySku({ vendorId: vendor.id, sku: decodeURIComponent(sku) });
  return cutter ? { vendor, cutter } : null;
});
