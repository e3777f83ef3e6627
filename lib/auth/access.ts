import "server-only";

import type { Vendor } from "@/content-schema/vendor";
import { NotFound, Unauthenticated } from "@/lib/errors/domain-errors";
import { findVendorBySlug } from "@/lib/vendors/get-vendor";

import { findMembership, type Member } from "./membership";
import { can, type Permission } from "./permissions";
import type { SessionUser } from "./session-user";

export type VendorAccess = { vendor: Vendor; user: SessionUser | null; member: Member | null };

/**
 * The one place that decides who may do what in a vendor's space.
 * Unknown vendor, non-member or missing permission all answer NotFound, so nothing reveals
 * that another vendor's object exists; only a visitor who could sign in is told to.
 */
export async function resolveVendorAccess(vendorSlug: string, user: SessionUser | null, permission?: Permission): Promise<VendorAccess> {
  const vendor = await findVendorBySlug(vendorSlug);
  if (!vendor) throw new NotFound();
  const member = user ? await findMembership(vendor.id, user.id) : null;
  if (!permission) return { vendor, user, member };
  if (permission === "library.read" && vendor.settings.libraryPublic) return { vendor, user, member };
  if (!user) throw new Unauthenticated();
  if (!member || !can(member.role, permission)) throw new NotFound();
  return { vendor, user, member };
}

export function requireMember(access: VendorAccess): asserts access is VendorAccess & { user: SessionUser; member: Member } {
  if (!access.user) throw new Unauthenticated();
  if (!access.member) throw new NotFound();
}
