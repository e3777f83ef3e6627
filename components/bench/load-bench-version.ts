import "server-only";

import { cache } from "react";

import { requirePageAccess } from "@/lib/auth/page-access";
import { loadAdaptContext } from "@/lib/bench/load-adapt-context";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** A readable, not withdrawn sheet version of the vendor, for the Bench adapt page's layout and page. */
export const loadBenchVersion = cache(async (vendorSlug: string, versionId: string) => {
  const { vendor, user } = await requirePageAccess(vendorSlug, "bench.use", `/${vendorSlug}/bench/adapt/${versionId}`);
  if (!user || !UUID.test(versionId)) return null;
  const context = await loadAdaptContext({ vendorId: vendor.id, versionId });
  return context && context.versionState !== "withdrawn" ? { vendor, user, context } : null;
});
