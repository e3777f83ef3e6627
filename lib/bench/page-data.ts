import "server-only";

import { cache } from "react";

import { findAdaptContext } from "@/lib/adapt/page-data";
import { requirePageAccess } from "@/lib/auth/page-access";
import { isUuid } from "@/lib/ids/is-uuid";

import { findSetup } from "./list-setups";
import { findMachine } from "./machines";

// The Bench's page data: each lookup runs once per request, shared by a segment's layout (the 404) and its page.
// `find…` answers null for "not found here", which the layout turns into a 404.

/** The customer's machine; vendor and owner in the WHERE. */
export const findBenchMachine = cache(async (vendorSlug: string, id: string) => {
  const { vendor, user } = await requirePageAccess(vendorSlug, "bench.use", `/${vendorSlug}/bench/machines/${id}`);
  if (!user || !isUuid(id)) return null;
  const machine = await findMachine({ vendorId: vendor.id, userId: user.id, machineId: id });
  return machine ? { vendor, user, machine } : null;
});

/** The customer's setup; vendor and owner in the WHERE. */
export const findBenchSetup = cache(async (vendorSlug: string, id: string) => {
  const { vendor, user } = await requirePageAccess(vendorSlug, "bench.use", `/${vendorSlug}/bench/setups/${id}`);
  if (!user) return null;
  const setup = await findSetup({ vendorId: vendor.id, userId: user.id, setupId: id });
  return setup ? { vendor, user, setup } : null;
});

/** A readable, not withdrawn sheet version of the vendor, for the Bench adapt page. */
export const findBenchVersion = cache(async (vendorSlug: string, versionId: string) => {
  const { vendor, user } = await requirePageAccess(vendorSlug, "bench.use", `/${vendorSlug}/bench/adapt/${versionId}`);
  if (!user || !isUuid(versionId)) return null;
  const context = await findAdaptContext(vendor.id, versionId);
  return context && context.versionState !== "withdrawn" ? { vendor, user, context } : null;
});
