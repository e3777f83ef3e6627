import "server-only";

import { cache } from "react";

import { getCutterBySku, getMachineClassBySlug, getMaterialBySlug } from "@/lib/catalogue/get-catalogue-item";
import { getVendorBySlug } from "@/lib/vendors/get-vendor";

// One lookup per request, shared by a segment's layout (the 404) and its page.
export const loadCutter = cache(async (vendorSlug: string, sku: string) => {
  const vendor = await getVendorBySlug(vendorSlug);
  return vendor ? getCutterBySku({ vendorId: vendor.id, sku: decodeURIComponent(sku) }) : null;
});

export const loadMaterial = cache(async (vendorSlug: string, slug: string) => {
  const vendor = await getVendorBySlug(vendorSlug);
  return vendor ? getMaterialBySlug({ vendorId: vendor.id, slug: decodeURIComponent(slug) }) : null;
});

export const loadMachineClass = cache(async (vendorSlug: string, slug: string) => {
  const vendor = await getVendorBySlug(vendorSlug);
  return vendor ? getMachineClassBySlug({ vendorId: vendor.id, slug: decodeURIComponent(slug) }) : null;
});
