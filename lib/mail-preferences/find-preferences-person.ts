import "server-only";

import type { Vendor } from "@/content-schema/vendor";
import { findMembership } from "@/lib/auth/membership";
import type { Role } from "@/lib/auth/roles";
import { findSessionUser } from "@/lib/auth/session-user";
import { db } from "@/lib/db/knex";
import { findVendorBySlug } from "@/lib/vendors/get-vendor";

import { readPreferencesToken } from "./preferences-link";

export type PreferencesPerson = { vendor: Vendor; userId: string; email: string; role: Role; viaLink: boolean };

/**
 * Whose mail preferences a request may see and change: the person a signed link from a mail was made for (no
 * sign-in needed, and only under the vendor it was made for), else the signed-in member. Nobody otherwise, and
 * never a person who is no longer a member of this vendor.
 */
export async function findPreferencesPerson({
  vendorSlug,
  token,
}: {
  vendorSlug: string;
  token?: string | null;
}): Promise<PreferencesPerson | null> {
  const vendor = await findVendorBySlug(vendorSlug);
  if (!vendor) return null;
  const fromLink = token ? readPreferencesToken(token) : null;
  if (token && (!fromLink || fromLink.vendorId !== vendor.id)) return null;
  const userId = fromLink?.userId ?? (await findSessionUser())?.id;
  if (!userId) return null;
  const member = await findMembership(vendor.id, userId);
  if (!member) return null;
  const user = await db("users").where({ id: userId }).first("email");
  return user ? { vendor, userId, email: user.email, role: member.role, viaLink: Boolean(fromLink) } : null;
}
