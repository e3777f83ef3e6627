import "server-only";

import { cache } from "react";

import { findCutterBySku, findMachineClassBySlug, findMaterialBySlug } from "@/lib/catalogue/find-catalogue-item";
import { safeDecode } from "@/lib/http/safe-decode";
import { findVendorBySlug } from "@/lib/vendors/get-vendor";

// One lookup per request, shared by a segment's layout (the 404) and its page.
export const findDraftingCutter = cache(async (vendorSlug: string, sku: string) => {
  const vendor = await findVendorBySlug(vendorSlug);
  const decoded = safeDecode(sku);
  return vendor && decoded !== null ? findCutterBySku({ vendorId: vendor.id, sku: decoded }) : null;
});

export const findDraftingMaterial = cache(async (vendorSlug: string, slug: string) => {
  const vendor = await findVendorBySlug(vendorSlug);
  const decoded = safeDecode(slug);
  return vendor && decoded !== null ? findMaterialBySlug({ vendorId: vendor.id, slug: decoded }) : null;
});

export const findDraftingMachineClass = cache(async (vendorSlug: string, slug: string) => {
  const vendor = await findVendorBySlug(vendorSlug);
  const decoded = safeDecode(slug);
  return vendor && decoded !== null ? findMachineClassBySlug({ vendorId: vendor.id, slug: decoded }) : null;
});
