import "server-only";

import type { VendorAccess } from "@/lib/auth/access";
import { Unauthenticated } from "@/lib/errors/domain-errors";

/** The vendor and signed-in user of a write request (withVendor has already checked the permission). */
export function apiActor(access: VendorAccess): { vendorId: string; userId: string } {
  if (!access.user) throw new Unauthenticated();
  return { vendorId: access.vendor.id, userId: access.user.id };
}
