import "server-only";

import { cache } from "react";

import { requirePageAccess } from "@/lib/auth/page-access";
import { getSetup } from "@/lib/bench/list-setups";
import { getMachine } from "@/lib/bench/machines";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** One lookup per request for a Bench object page's layout (404) and page; vendor and owner in the WHERE. */
export const loadBenchMachine = cache(async (vendorSlug: string, id: string) => {
  const { vendor, user } = await requirePageAccess(vendorSlug, "bench.use", `/${vendorSlug}/bench/machines/${id}`);
  if (!user || !UUID.test(id)) return null;
  const machine = await getMachine({ vendorId: vendor.id, userId: user.id, machineId: id });
  return machine ? { vendor, user, machine } : null;
});

export const loadBenchSetup = cache(async (vendorSlug: string, id: string) => {
  const { vendor, user } = await requirePageAccess(vendorSlug, "bench.use", `/${vendorSlug}/bench/setups/${id}`);
  if (!user) return null;
  const setup = await getSetup({ vendorId: vendor.id, userId: user.id, setupId: id });
  return setup ? { vendor, user, setup } : null;
});
