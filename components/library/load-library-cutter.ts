import "server-only";

import { cache } from "react";

import { getCutterBySku } from "@/lib/catalogue/get-catalogue-item";
import { safeDecode } from "@/lib/http/safe-decode";
import { getVendorBySlug } from "@/lib/vendors/get-vendor";

export const loadLibraryCutter = cache(async (vendorSlug: string, sku: string) => {
  const vendor = await getVendorBySlug(vendorSlug);
  const decoded = safeDecode(sku);
  if (!vendor || decoded === null) return null;
  const cutter = await getCutterBySku({ vendorId: vendor.id, sku: decoded });
  return cutter ? { vendor, cutter } : null;
});
