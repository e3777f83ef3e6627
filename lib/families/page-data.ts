import "server-only";

import { cache } from "react";

import { DomainError } from "@/lib/errors/domain-errors";
import { safeDecode } from "@/lib/http/safe-decode";
import { findVendorBySlug } from "@/lib/vendors/get-vendor";

import { getBatch } from "./get-batch";
import { getFamily } from "./get-family";

const orNull = async <T>(read: () => Promise<T>): Promise<T | null> => {
  try {
    return await read();
  } catch (error) {
    if (error instanceof DomainError && error.code === "not_found") return null;
    throw error;
  }
};

/** The family of a route segment, or null (another vendor's family is simply not found). */
export const findDraftingFamily = cache(async (vendorSlug: string, slug: string) => {
  const vendor = await findVendorBySlug(vendorSlug);
  const decoded = safeDecode(slug);
  return vendor && decoded !== null ? orNull(() => getFamily({ vendorId: vendor.id, slug: decoded })) : null;
});

export const findFamilyBatch = cache(async (vendorSlug: string, slug: string, batch: string) => {
  const family = await findDraftingFamily(vendorSlug, slug);
  const vendor = await findVendorBySlug(vendorSlug);
  const number = /^[1-9][0-9]{0,8}$/.test(batch) ? Number(batch) : null;
  return family && vendor && number ? orNull(() => getBatch({ vendorId: vendor.id, familyId: family.id, number })) : null;
});
